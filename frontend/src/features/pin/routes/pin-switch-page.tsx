import { useSuspenseQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { useNavigate } from 'react-router';

import type { PinUser } from '@tracewright/shared';

import { TextLink } from '../../../components/ui/text-link';
import { pinUsersQueryOptions } from '../api/get-pin-users';
import { PersonPicker } from '../components/person-picker';
import { PinEntryForm } from '../components/pin-entry-form';
import { UntrustedTablet } from '../components/untrusted-tablet';

export function PinSwitchPage() {
  const { data } = useSuspenseQuery(pinUsersQueryOptions());
  const [picked, setPicked] = useState<PinUser | null>(null);
  const navigate = useNavigate();

  return (
    <section aria-labelledby="pin-title" className="space-y-6">
      <title>Switch person · Tracewright</title>
      <h1 id="pin-title" className="text-3xl font-bold">
        Who is working here?
      </h1>
      {!data.isTrustedDevice ? (
        <UntrustedTablet />
      ) : picked ? (
        <PinEntryForm user={picked} onBack={() => setPicked(null)} onSwitched={() => void navigate('/', { replace: true })} />
      ) : (
        <>
          <p className="text-lg text-graphite-700">Tap your name, then enter your PIN.</p>
          <PersonPicker users={data.users} onPick={setPicked} />
          <p>
            <TextLink to="/sign-in">Sign in with e-mail and password instead</TextLink>
          </p>
        </>
      )}
    </section>
  );
}
