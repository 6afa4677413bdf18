import { labDayRange, textSearchPlan, type DeviationQuery } from '@tracewright/shared';

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
 * Dates are lab days in the lab's time zone.
 */
export function queueFilter(query: DeviationQuery, timeZone: string, withState = true): SqlFilter {
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
  if (query.q) addText(query.q, add);
  return { where: parts.length > 0 ? parts.join(' AND ') : '1 = 1', replacements };
}

/** Words the FULLTEXT index holds go through MATCH; short and common ones through LIKE (see migration 0013). */
function addText(q: string, add: (sql: string, values?: Record<string, unknown>) => void) {
  const plan = textSearchPlan(q);
  if (plan.booleanQuery) add('MATCH (title, expected, actual) AGAINST (:fulltext IN BOOLEAN MODE)', { fulltext: plan.booleanQuery });
  plan.likeWords.forEach((word, i) => {
    add(`(title LIKE :like${i} OR expected LIKE :like${i} OR actual LIKE :like${i})`, { [`like${i}`]: `%${escapeLike(word)}%` });
  });
}

/** Newest first by default; ties broken by id so paging never shows a row twice. */
export const QUEUE_ORDER: Record<DeviationQuery['sort'], string> = {
  newest: 'created_at DESC, id DESC',
  oldest: 'created_at ASC, id ASC',
  severity: "FIELD(severity, 'critical', 'major', 'minor'), created_at DESC, id DESC",
};
