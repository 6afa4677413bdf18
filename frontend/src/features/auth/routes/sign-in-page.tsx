import { useNavigate, useSearchParams } from 'react-router';

import { Icon } from '../../../components/icons/icon';
import { TextLink } from '../../../components/ui/text-link';
import { safeNextPath } from '../../../lib/sign-in-path';
import { SignInForm } from '../components/sign-in-form';

export function SignInPage() {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const next = safeNextPath(params.get('next'));

  return (
    <section aria-labelledby="sign-in-title" className="max-w-md">
      <title>Sign in · Tracewright</title>
      <h1 id="sign-in-title" className="mb-2 text-3xl font-bold">
        Sign in
      </h1>
      <p className="mb-6 text-graphite-700">Use the e-mail address your lab admin invited.</p>
      <SignInForm onSignedIn={() => void navigate(next, { replace: true })} />
      <ul className="mt-6 flex flex-col gap-3">
        <li>
          <TextLink to="/forgot-password">Forgot your password?</TextLink>
        </li>
        <li>
          <TextLink to="/pin" className="inline-flex items-center gap-2">
            <Icon name="keypad" />
            Switch with PIN
          </TextLink>
        </li>
      </ul>
    </section>
  );
}
