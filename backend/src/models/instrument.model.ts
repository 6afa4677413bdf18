import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

import type { Instrument } from '@tracewright/shared';

import { notes, recordAttributes } from './record-attributes';

export class InstrumentModel extends Model<InferAttributes<InstrumentModel>, InferCreationAttributes<InstrumentModel>> {
  declare id: CreationOptional<number>;
  declare name: string;
  declare kind: Instrument['kind'];
  declare serialNumber: string;
  declare calibrationDueOn: string | null;
  declare notes: string;
  declare version: CreationOptional<number>;
  declare archived: CreationOptional<boolean>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    InstrumentModel.init(
      {
        ...recordAttributes(),
        name: { type: DataTypes.STRING(120), allowNull: false },
        kind: { type: DataTypes.STRING(40), allowNull: false },
        serialNumber: { type: DataTypes.STRING(60), allowNull: false, defaultValue: '' },
        calibrationDueOn: { type: DataTypes.DATEONLY, allowNull: true },
        notes: notes(),
      },
      { sequelize, tableName: 'instruments' },
    );
  }
}
