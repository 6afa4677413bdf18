import type { Sequelize } from 'sequelize';

import { AuditEventModel } from './audit-event.model';
import { HeatSourceModel } from './heat-source.model';
import { InkModel } from './ink.model';
import { InstrumentModel } from './instrument.model';
import { LabSettingsModel } from './lab-settings.model';
import { MaterialLotModel } from './material-lot.model';
import { OneTimeTokenModel } from './one-time-token.model';
import { PrinterChannelModel } from './printer-channel.model';
import { PrinterModel } from './printer.model';
import { RecipeVersionModel } from './recipe-version.model';
import { RecipeModel } from './recipe.model';
import { SignatureModel } from './signature.model';
import { StoredFileModel } from './stored-file.model';
import { SubstrateModel } from './substrate.model';
import { SurfaceTreaterModel } from './surface-treater.model';
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

  OneTimeTokenModel.belongsTo(UserModel, { foreignKey: 'userId', as: 'user' });
  AuditEventModel.belongsTo(UserModel, { foreignKey: 'actorId', as: 'actor', constraints: false });
  PrinterModel.hasMany(PrinterChannelModel, { foreignKey: 'printerId', as: 'channels' });
  PrinterChannelModel.belongsTo(InkModel, { foreignKey: 'inkId', as: 'ink' });
}
