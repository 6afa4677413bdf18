import { Notice } from '../../../components/ui/notice';
import { TextLink } from '../../../components/ui/text-link';
import type { TokenPreview } from '../api/get-token-preview';

const TITLES: Record<Exclude<TokenPreview['state'], 'valid'>, string> = {
  expired: 'This link has expired.',
  used: 'This link has already been used.',
  unknown: 'This link does not work any more.',
  malformed: 'This link is not complete.',
};

const WHY: Record<Exclude<TokenPreview['state'], 'valid'>, string> = {
  expired: 'Links are valid for a short time, so that an old e-mail cannot be used to take over an account.',
  used: 'Each link works once. If you set your password with it, sign in with that password.',
  unknown: 'It may have been used already, or a newer link replaced it.',
  malformed: 'Part of the address may have been cut off. Try opening it again from the e-mail.',
};

export function TokenProblem({ state }: { state: Exclude<TokenPreview['state'], 'valid'> }) {
  return (
    <div className="space-y-4">
      <Notice tone="warning" title={TITLES[state]}>
        <p>{WHY[state]}</p>
        <p>
          Was it a password reset? <TextLink to="/forgot-password">Ask for a new reset link</TextLink>. Was it an
          invitation? Ask your lab admin to send the invitation again.
        </p>
      </Notice>
      <p>
        <TextLink to="/sign-in">Go to sign in</TextLink>
      </p>
    </div>
  );
}
