import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from 'sequelize';

import type { PrinterChannelModel } from './printer-channel.model';
import { notes, recordAttributes, requiredNumber } from './record-attributes';

export class PrinterModel extends Model<InferAttributes<PrinterModel>, InferCreationAttributes<PrinterModel>> {
  declare id: CreationOptional<number>;
  declare name: string;
  declare model: string;
  declare nozzleDiameterUm: number;
  declare dropVolumePl: number;
  declare jettingSpeedMetresPerSecond: number;
  declare nativeDpi: number;
  declare notes: string;
  declare version: CreationOptional<number>;
  declare archived: CreationOptional<boolean>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  /** Loaded with `include: 'channels'`; see models/index.ts. */
  declare channels?: NonAttribute<PrinterChannelModel[]>;

  static initModel(sequelize: Sequelize) {
    PrinterModel.init(
      {
        ...recordAttributes(),
        name: { type: DataTypes.STRING(120), allowNull: false },
        model: { type: DataTypes.STRING(120), allowNull: false, defaultValue: '' },
        nozzleDiameterUm: requiredNumber(),
        dropVolumePl: requiredNumber(),
        jettingSpeedMetresPerSecond: requiredNumber(),
        nativeDpi: requiredNumber(),
        notes: notes(),
      },
      { sequelize, tableName: 'printers' },
    );
  }
}
