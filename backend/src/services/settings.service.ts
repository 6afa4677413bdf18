import type { Transaction } from 'sequelize';

import type { LabSettings } from '@tracewright/shared';

import type { AppContext } from '../app-context';
import { LabSettingsModel } from '../models/lab-settings.model';
import { recordAudit } from './audit.service';

const DEFAULTS: LabSettings = { labName: 'Our lab', timeZone: 'UTC', paperSize: 'A4' };

const toDto = (s: LabSettingsModel): LabSettings => ({ labName: s.labName, timeZone: s.timeZone, paperSize: s.paperSize });

/**
 * The settings as last read, for at most KEEP_MS. Nearly every request needs the lab's time zone,
 * and the settings change a few times a year; a change made here forgets them once it commits,
 * and one made by another server process is seen within KEEP_MS.
 */
const KEEP_MS = 10_000;
let known: { settings: Promise<LabSettings>; until: number } | null = null;

export function getLabSettings(): Promise<LabSettings> {
  if (known && Date.now() < known.until) return known.settings;
  const settings = LabSettingsModel.findByPk(1).then((row) => (row ? toDto(row) : DEFAULTS));
  const entry = { settings, until: Date.now() + KEEP_MS };
  known = entry;
  // A failed read is not kept: the next request asks the database again.
  settings.catch(() => {
    if (known === entry) known = null;
  });
  return settings;
}

/** Drops the kept settings, so the next read goes to the database. */
export function forgetLabSettings(transaction?: Transaction): void {
  if (transaction)
    transaction.afterCommit(() => {
      known = null;
    });
  else known = null;
}

export async function updateLabSettings(ctx: AppContext, actorId: number, input: LabSettings): Promise<LabSettings> {
  return ctx.sequelize.transaction(async (transaction) => {
    const row = await LabSettingsModel.findByPk(1, { transaction, lock: transaction.LOCK.UPDATE });
    const before = row ? toDto(row) : null;
    const saved = row
      ? await row.update({ ...input, updatedAt: ctx.clock.now() }, { transaction })
      : await LabSettingsModel.create({ id: 1, ...input, updatedAt: ctx.clock.now() }, { transaction });
    await recordAudit(
      ctx,
      { actorId, action: 'settings.updated', entityType: 'lab-settings', entityId: 1, before, after: toDto(saved) },
      transaction,
    );
    forgetLabSettings(transaction);
    return toDto(saved);
  });
}
