import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

import type { SurfaceTreater } from '@tracewright/shared';

import { notes, recordAttributes } from './record-attributes';

export class SurfaceTreaterModel extends Model<InferAttributes<SurfaceTreaterModel>, InferCreationAttributes<SurfaceTreaterModel>> {
  declare id: CreationOptional<number>;
  declare name: string;
  declare method: SurfaceTreater['method'];
  declare calibrationDueOn: string | null;
  declare notes: string;
  declare version: CreationOptional<number>;
  declare archived: CreationOptional<boolean>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    SurfaceTreaterModel.init(
      {
        ...recordAttributes(),
        name: { type: DataTypes.STRING(120), allowNull: false },
        method: { type: DataTypes.STRING(30), allowNull: false },
        calibrationDueOn: { type: DataTypes.DATEONLY, allowNull: true },
        notes: notes(),
      },
      { sequelize, tableName: 'surface_treaters' },
    );
  }
}
