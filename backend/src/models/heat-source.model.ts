import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

import type { HeatSource } from '@tracewright/shared';

import { notes, recordAttributes, requiredNumber } from './record-attributes';

export class HeatSourceModel extends Model<InferAttributes<HeatSourceModel>, InferCreationAttributes<HeatSourceModel>> {
  declare id: CreationOptional<number>;
  declare name: string;
  declare kind: HeatSource['kind'];
  declare maxTempC: number;
  declare calibrationDueOn: string | null;
  declare notes: string;
  declare version: CreationOptional<number>;
  declare archived: CreationOptional<boolean>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    HeatSourceModel.init(
      {
        ...recordAttributes(),
        name: { type: DataTypes.STRING(120), allowNull: false },
        kind: { type: DataTypes.STRING(30), allowNull: false },
        maxTempC: requiredNumber(),
        calibrationDueOn: { type: DataTypes.DATEONLY, allowNull: true },
        notes: notes(),
      },
      { sequelize, tableName: 'heat_sources' },
    );
  }
}
