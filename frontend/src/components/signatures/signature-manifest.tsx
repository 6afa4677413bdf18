import type { z } from 'zod';

import type { SignatureViewSchema } from '@tracewright/shared';

import { formatDateTime } from '../../lib/format-date';

type SignatureManifestProps = { signature: z.infer<typeof SignatureViewSchema> };

/**
 * A signature as the record shows it (21 CFR 11.50): the signer's printed name, the date and
 * time of signing, and what the signature means, plus the hash of the exact record signed.
 */
export function SignatureManifest({ signature }: SignatureManifestProps) {
  return (
    <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 rounded-md border border-graphite-300 bg-graphite-50 p-3 text-sm">
      <dt className="font-bold">Signed by</dt>
      <dd>{signature.signedBy}</dd>
      <dt className="font-bold">Signed at</dt>
      <dd className="tabular">{formatDateTime(signature.signedAt, true)}</dd>
      <dt className="font-bold">Meaning</dt>
      <dd>{signature.meaning}</dd>
      <dt className="font-bold">Record hash</dt>
      <dd className="break-all font-mono text-xs">{signature.contentHash}</dd>
    </dl>
  );
}
