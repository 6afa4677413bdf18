import { DISPOSITION_LABELS, type Disposition } from '@tracewright/shared';

import { RUN_SIGN_OFF_MEANING } from '../../../components/signatures/signature-meanings';

/** The meaning each signature carries, in the words shown to the signer before they sign. */
export const SIGN_MEANINGS = {
  disposition: (disposition: Disposition) =>
    `Dispositioned: I have reviewed this deviation and decide “${DISPOSITION_LABELS[disposition]}” for the pieces named.`,
  close: 'Verified and closed: the corrective action is done and works, and this record is final.',
  runSignOff: RUN_SIGN_OFF_MEANING,
} as const;
