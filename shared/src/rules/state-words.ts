/**
 * A record's state as it reads in a sentence: the stored names join words with hyphens
 * ('in-progress', 'not-done'), which a message to a person must not show.
 * @example stateInWords('on-hold') // → 'on hold'
 */
export const stateInWords = (state: string): string => state.replace(/-/g, ' ');
