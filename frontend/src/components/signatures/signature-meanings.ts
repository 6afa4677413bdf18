/**
 * What signing a run's record off means, in the words shown to the signer before they sign. The
 * run record page and the quality dashboard both offer the sign-off, so both read it here.
 */
export const RUN_SIGN_OFF_MEANING = 'Run record reviewed and accepted: every step, reading and deviation of this run has been checked.';
