import { useSuspenseQuery } from '@tanstack/react-query';
import { useNavigate, useParams } from 'react-router';

import { tokenPreviewQueryOptions } from '../api/get-token-preview';
import { SetPasswordForm } from '../components/set-password-form';
import { TokenProblem } from '../components/token-problem';

export function SetPasswordPage() {
  const token = useParams().token ?? '';
  const navigate = useNavigate();
  const { data } = useSuspenseQuery(tokenPreviewQueryOptions(token));
  const isInvitation = data.state === 'valid' && data.preview.purpose === 'invitation';
  const title = isInvitation ? 'Welcome to Tracewright' : 'Choose a new password';

  return (
    <section aria-labelledby="set-password-title" className="max-w-md space-y-6">
      <title>{`${title} · Tracewright`}</title>
      <h1 id="set-password-title" className="text-3xl font-bold">
        {data.state === 'valid' ? title : 'Link problem'}
      </h1>
      {data.state === 'valid' ? (
        <>
          <div className="rounded-md border border-graphite-200 bg-white p-4">
            <p className="font-bold">{data.preview.name}</p>
            <p className="text-graphite-700">{data.preview.email}</p>
          </div>
          <p className="text-graphite-700">
            {isInvitation
              ? 'You were invited to your lab’s workspace. Choose a password to finish; you will be signed in right away.'
              : 'Someone asked to reset the password for this account. Choose a new one; you will be signed in right away.'}
          </p>
          <SetPasswordForm token={token} email={data.preview.email} onDone={() => void navigate('/', { replace: true })} />
        </>
      ) : (
        <TokenProblem state={data.state} />
      )}
    </section>
  );
}
