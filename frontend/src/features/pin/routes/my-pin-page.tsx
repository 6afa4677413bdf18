import { useState } from 'react';

import { Notice } from '../../../components/ui/notice';
import { PageHeader } from '../../../components/ui/page-header';
import { StatusBadge } from '../../../components/ui/status-badge';
import { useSession } from '../../../lib/session';
import { SetPinForm } from '../components/set-pin-form';

export function MyPinPage() {
  const { user } = useSession();
  const [isSaved, setIsSaved] = useState(false);

  return (
    <>
      <PageHeader
        title="My PIN"
        description="A PIN lets you switch to yourself on a shared tablet with a few taps, once someone has signed in on it with a password."
      />
      <div className="space-y-6">
        <p className="flex items-center gap-3">
          <span className="font-bold">Your PIN:</span>
          {user.hasPin ? <StatusBadge tone="pass" label="Set" /> : <StatusBadge tone="neutral" label="Not set" />}
        </p>
        <div role="status">
          {isSaved ? <Notice tone="pass" title="Your PIN is saved. Use it under “Switch person”." /> : null}
        </div>
        <h2 className="text-xl font-bold">{user.hasPin ? 'Change your PIN' : 'Set a PIN'}</h2>
        <SetPinForm email={user.email} onSaved={() => setIsSaved(true)} />
      </div>
    </>
  );
}
