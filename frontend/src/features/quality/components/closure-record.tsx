import type { DeviationDetail } from '@tracewright/shared';

import { DetailSection } from './detail-section';
import { SignatureManifest } from '../../../components/signatures/signature-manifest';

/** How the deviation was closed: the verification written by the signer, and the signature. */
export function ClosureRecord({ closure }: { closure: NonNullable<DeviationDetail['closure']> }) {
  return (
    <DetailSection title="Closure">
      {closure.verificationNote ? <p className="whitespace-pre-wrap">{closure.verificationNote}</p> : null}
      <SignatureManifest signature={closure.signature} />
    </DetailSection>
  );
}
