import { FULLTEXT_MIN_WORD, labDayRange, textSearchPlan, type DeviationQuery } from '@tracewright/shared';

/** A WHERE clause over `deviations` with its named replacements. */
export interface SqlFilter {
  where: string;
  replacements: Record<string, unknown>;
}

const escapeLike = (text: string) => text.replace(/[%_\\]/g, '\\$&');

/**
 * The queue's filters as SQL over the deviations table alone (recipe and step kind are copied
 * there, migration 0013), so each combination can use one of the queue indexes. `withState`
 * false drops the state filter: the counts per state are taken over the other filters.
 * Dates are lab days in the lab's time zone. `minWord` is the server's innodb_ft_min_token_size.
 */
export function queueFilter(query: DeviationQuery, timeZone: string, withState = true, minWord = FULLTEXT_MIN_WORD): SqlFilter {
  const parts: string[] = [];
  const replacements: Record<string, unknown> = {};
  const add = (sql: string, values: Record<string, unknown> = {}) => {
    parts.push(sql);
    Object.assign(replacements, values);
  };
  if (withState && query.state?.length) add('state IN (:states)', { states: query.state });
  if (query.severity?.length) add('severity IN (:severities)', { severities: query.severity });
  if (query.rule?.length) add('rule IN (:rules)', { rules: query.rule });
  if (query.recipeId) add('recipe_id = :recipeId', { recipeId: query.recipeId });
  if (query.runId) add('run_id = :runId', { runId: query.runId });
  if (query.stepKind) add('step_kind = :stepKind', { stepKind: query.stepKind });
  if (query.operatorId) add('created_by = :operatorId', { operatorId: query.operatorId });
  const range = labDayRange(query.from, query.to, timeZone);
  if (range.start) add('created_at >= :start', { start: range.start });
  if (range.end) add('created_at < :end', { end: range.end });
  if (query.q) addText(query.q, minWord, add);
  return { where: parts.length > 0 ? parts.join(' AND ') : '1 = 1', replacements };
}

/**
 * InnoDB's built-in stopwords of under 3 letters (MariaDB's default list): the index skips them
 * whatever the token size, so they stay with LIKE.
 */
const SHORT_STOPWORDS = new Set(['a', 'i', 'an', 'as', 'at', 'be', 'by', 'de', 'en', 'in', 'is', 'it', 'la', 'of', 'on', 'or', 'to']);

/**
 * Words the FULLTEXT index holds go through MATCH; the rest through LIKE (see migration 0013).
 * The shared plan assumes the stock 3-letter minimum; where the server indexes shorter words
 * (ours start with innodb_ft_min_token_size=2), those join the MATCH too: a lone "Ag" through
 * LIKE '%ag%' reads every row, some 0.8 s at 100 000 deviations (`npm run bench`).
 */
function addText(q: string, minWord: number, add: (sql: string, values?: Record<string, unknown>) => void) {
  const plan = textSearchPlan(q);
  const isIndexed = (w: string) => [...w].length >= minWord && !SHORT_STOPWORDS.has(w);
  const shortIndexed = plan.likeWords.filter((w) => [...w].length < FULLTEXT_MIN_WORD && isIndexed(w));
  const terms = [plan.booleanQuery, ...shortIndexed.map((w) => `+${w}*`)].filter((t) => t !== null).join(' ');
  if (terms) add('MATCH (title, expected, actual) AGAINST (:fulltext IN BOOLEAN MODE)', { fulltext: terms });
  plan.likeWords
    .filter((w) => !shortIndexed.includes(w))
    .forEach((word, i) => {
      add(`(title LIKE :like${i} OR expected LIKE :like${i} OR actual LIKE :like${i})`, { [`like${i}`]: `%${escapeLike(word)}%` });
    });
}

/** Newest first by default; ties broken by id so paging never shows a row twice. */
export const QUEUE_ORDER: Record<DeviationQuery['sort'], string> = {
  newest: 'created_at DESC, id DESC',
  oldest: 'created_at ASC, id ASC',
  severity: "FIELD(severity, 'critical', 'major', 'minor'), created_at DESC, id DESC",
};
