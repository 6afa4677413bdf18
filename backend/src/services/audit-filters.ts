import { col, Op, where, type WhereOptions } from 'sequelize';

import { labDayRange, type AuditExportQuery } from '@tracewright/shared';

const escapeLike = (text: string) => text.replace(/[%_\\]/g, '\\$&');

/**
 * The audit search as a WHERE: entity type and id, actor, action prefix (e.g. `deviation.`), a
 * range of lab days, and words that must each appear in the action, entity id, reason or the
 * before/after record. Text uses LIKE: the other filters and the id order narrow the rows first,
 * and a full-text index over the ever-growing JSON columns would cost more than it saves here.
 */
export function auditFilter(query: AuditExportQuery, timeZone: string): WhereOptions {
  const and: WhereOptions[] = [];
  if (query.entityType) and.push({ entityType: query.entityType });
  if (query.entityId) and.push({ entityId: query.entityId });
  if (query.actorId) and.push({ actorId: query.actorId });
  if (query.action) and.push({ action: { [Op.like]: `${escapeLike(query.action)}%` } });
  const range = labDayRange(query.from, query.to, timeZone);
  if (range.start) and.push({ at: { [Op.gte]: range.start } });
  if (range.end) and.push({ at: { [Op.lt]: range.end } });
  for (const word of (query.q ?? '').split(/\s+/).filter(Boolean)) {
    const pattern = `%${escapeLike(word)}%`;
    and.push({
      [Op.or]: [
        { action: { [Op.like]: pattern } },
        { entityId: { [Op.like]: pattern } },
        { reason: { [Op.like]: pattern } },
        where(col('before_json'), Op.like, pattern),
        where(col('after_json'), Op.like, pattern),
      ],
    });
  }
  return { [Op.and]: and };
}
