import type { Sequelize } from 'sequelize';

import { AuditEventModel } from './audit-event.model';
import { DeviationDispositionModel } from './deviation-disposition.model';
import { DeviationEventModel } from './deviation-event.model';
import { DeviationModel } from './deviation.model';
import { HeatSourceModel } from './heat-source.model';
import { IdempotencyKeyModel } from './idempotency-key.model';
import { InkModel } from './ink.model';
import { InstrumentModel } from './instrument.model';
import { LabSettingsModel } from './lab-settings.model';
import { MaterialLotModel } from './material-lot.model';
import { OneTimeTokenModel } from './one-time-token.model';
import { PrinterChannelModel } from './printer-channel.model';
import { PrinterModel } from './printer.model';
import { RecipeVersionModel } from './recipe-version.model';
import { RecipeModel } from './recipe.model';
import { RunCureLogModel } from './run-cure-log.model';
import { RunEquipmentModel } from './run-equipment.model';
import { RunLotConfirmationModel } from './run-lot-confirmation.model';
import { RunLotModel } from './run-lot.model';
import { RunNozzleCheckModel } from './run-nozzle-check.model';
import { RunPieceModel } from './run-piece.model';
import { RunReadingModel } from './run-reading.model';
import { RunSignOffModel } from './run-sign-off.model';
import { RunStepRecordModel } from './run-step-record.model';
import { RunTimerModel } from './run-timer.model';
import { RunModel } from './run.model';
import { SignatureModel } from './signature.model';
import { StoredFileModel } from './stored-file.model';
import { SubstrateModel } from './substrate.model';
import { SurfaceTreaterModel } from './surface-treater.model';
import { TrendBaselineModel } from './trend-baseline.model';
import { TrendPointNoteModel } from './trend-point-note.model';
import { UserModel } from './user.model';

/** Binds every model to the connection and wires associations; call once per process. */
export function initModels(sequelize: Sequelize): void {
  UserModel.initModel(sequelize);
  OneTimeTokenModel.initModel(sequelize);
  LabSettingsModel.initModel(sequelize);
  AuditEventModel.initModel(sequelize);
  StoredFileModel.initModel(sequelize);
  InkModel.initModel(sequelize);
  SubstrateModel.initModel(sequelize);
  MaterialLotModel.initModel(sequelize);
  PrinterModel.initModel(sequelize);
  PrinterChannelModel.initModel(sequelize);
  HeatSourceModel.initModel(sequelize);
  SurfaceTreaterModel.initModel(sequelize);
  InstrumentModel.initModel(sequelize);
  RecipeModel.initModel(sequelize);
  RecipeVersionModel.initModel(sequelize);
  SignatureModel.initModel(sequelize);
  RunModel.initModel(sequelize);
  RunPieceModel.initModel(sequelize);
  RunLotModel.initModel(sequelize);
  RunEquipmentModel.initModel(sequelize);
  RunStepRecordModel.initModel(sequelize);
  RunTimerModel.initModel(sequelize);
  RunReadingModel.initModel(sequelize);
  RunLotConfirmationModel.initModel(sequelize);
  RunNozzleCheckModel.initModel(sequelize);
  RunCureLogModel.initModel(sequelize);
  DeviationModel.initModel(sequelize);
  IdempotencyKeyModel.initModel(sequelize);
  DeviationEventModel.initModel(sequelize);
  DeviationDispositionModel.initModel(sequelize);
  RunSignOffModel.initModel(sequelize);
  TrendPointNoteModel.initModel(sequelize);
  TrendBaselineModel.initModel(sequelize);

  OneTimeTokenModel.belongsTo(UserModel, { foreignKey: 'userId', as: 'user' });
  AuditEventModel.belongsTo(UserModel, { foreignKey: 'actorId', as: 'actor', constraints: false });
  PrinterModel.hasMany(PrinterChannelModel, { foreignKey: 'printerId', as: 'channels' });
  PrinterChannelModel.belongsTo(InkModel, { foreignKey: 'inkId', as: 'ink' });
  // The runs list filters by recipe code and name.
  RunModel.belongsTo(RecipeModel, { foreignKey: 'recipeId', as: 'recipe' });
}
