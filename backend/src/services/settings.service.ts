import type { LabSettings } from '@tracewright/shared';

import type { AppContext } from '../app-context';
import { LabSettingsModel } from '../models/lab-settings.model';
import { recordAudit } from './audit.service';

const DEFAULTS: LabSettings = { labName: 'Our lab', timeZone: 'UTC', paperSize: 'A4' };

const toDto = (s: LabSettingsModel): LabSettings => ({ labName: s.labName, timeZone: s.timeZone, paperSize: s.paperSize });

export async function getLabSettings(): Promise<LabSettings> {
  const row = await LabSettingsModel.findByPk(1);
  return row ? toDto(row) : DEFAULTS;
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
    return toDto(saved);
  });
}
