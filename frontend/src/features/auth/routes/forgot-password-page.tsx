import { useState } from 'react';

import { Notice } from '../../../components/ui/notice';
import { TextLink } from '../../../components/ui/text-link';
import { ForgotPasswordForm } from '../components/forgot-password-form';

export function ForgotPasswordPage() {
  const [isSent, setIsSent] = useState(false);

  return (
    <section aria-labelledby="forgot-title" className="max-w-md space-y-6">
      <title>Forgot password · Tracewright</title>
      <div>
        <h1 id="forgot-title" className="mb-2 text-3xl font-bold">
          Forgot your password?
        </h1>
        <p className="text-graphite-700">We will e-mail a link to choose a new one. The link works once, for a short time.</p>
      </div>
      {/* Always mounted, so the confirmation is announced when it appears. */}
      <div role="status">
        {isSent ? (
          <Notice tone="pass" title="If that address belongs to someone here, a reset link is on its way.">
            <p>Check your inbox, and the spam folder too. No mail after a few minutes? Ask your lab admin.</p>
          </Notice>
        ) : null}
      </div>
      {isSent ? null : <ForgotPasswordForm onSent={() => setIsSent(true)} />}
      <p>
        <TextLink to="/sign-in">Back to sign in</TextLink>
      </p>
    </section>
  );
}
