/**
 * InnoDB's built-in full-text stopwords (from memory of the MariaDB/MySQL manual): a required
 * stopword would match nothing, so such words are searched with LIKE instead.
 */
const INNODB_STOPWORDS = new Set([
  'a', 'about', 'an', 'are', 'as', 'at', 'be', 'by', 'com', 'de', 'en', 'for', 'from', 'how', 'i', 'in', 'is', 'it',
  'la', 'of', 'on', 'or', 'that', 'the', 'this', 'to', 'was', 'what', 'when', 'where', 'who', 'will', 'with', 'und', 'www',
]);

/** InnoDB indexes words of at least this many characters (innodb_ft_min_token_size's default, from memory). */
export const FULLTEXT_MIN_WORD = 3;

export interface TextSearchPlan {
  /** For MATCH … AGAINST (… IN BOOLEAN MODE): every word required, each as a prefix; null when no word qualifies. */
  booleanQuery: string | null;
  /** Words too short (or too common) for the index, each to be found with LIKE '%word%'. */
  likeWords: string[];
}

/**
 * Splits a search into what the full-text index can answer and what it cannot. Words are runs
 * of letters and digits, so operators typed by a person (+ - * " ~ < > @ ( )) never reach the
 * boolean query. Every word must match (AND), as a person expects from a search box.
 * @example textSearchPlan('silver cure Ag') // → { booleanQuery: '+silver* +cure*', likeWords: ['ag'] }
 * @example textSearchPlan('  ') // → { booleanQuery: null, likeWords: [] }
 */
export function textSearchPlan(q: string): TextSearchPlan {
  const words = [...new Set(q.toLowerCase().match(/[\p{L}\p{N}]+/gu) ?? [])];
  const indexed = words.filter((w) => [...w].length >= FULLTEXT_MIN_WORD && !INNODB_STOPWORDS.has(w));
  return {
    booleanQuery: indexed.length > 0 ? indexed.map((w) => `+${w}*`).join(' ') : null,
    likeWords: words.filter((w) => !indexed.includes(w)),
  };
}
