import { Notice } from '../../../components/ui/notice';
import { TextLink } from '../../../components/ui/text-link';

/** Why the PIN roster is empty on a new device, and the one thing that fixes it. */
export function UntrustedTablet() {
  return (
    <div className="max-w-prose space-y-4">
      <Notice tone="info" title="This tablet does not know anyone yet.">
        <p>
          Switching with a PIN works only on a device where someone has signed in with their e-mail and password at
          least once. That first sign-in makes the device trusted for the people of this lab.
        </p>
      </Notice>
      <p>
        <TextLink to="/sign-in">Sign in with e-mail and password</TextLink>
      </p>
    </div>
  );
}
