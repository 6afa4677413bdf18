import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

import type { Lot } from '@tracewright/shared';

import { recordAttributes } from './record-attributes';

/** A received container of an ink or substrate; dates are lab calendar days (YYYY-MM-DD). */
export class MaterialLotModel extends Model<InferAttributes<MaterialLotModel>, InferCreationAttributes<MaterialLotModel>> {
  declare id: CreationOptional<number>;
  declare materialType: Lot['materialType'];
  declare materialId: number;
  declare lotNumber: string;
  declare receivedOn: string;
  declare openedOn: string | null;
  declare expiresOn: string | null;
  declare notes: string;
  declare version: CreationOptional<number>;
  declare archived: CreationOptional<boolean>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    MaterialLotModel.init(
      {
        ...recordAttributes(),
        materialType: { type: DataTypes.ENUM('ink', 'substrate'), allowNull: false },
        materialId: { type: DataTypes.INTEGER, allowNull: false },
        lotNumber: { type: DataTypes.STRING(60), allowNull: false },
        receivedOn: { type: DataTypes.DATEONLY, allowNull: false },
        openedOn: { type: DataTypes.DATEONLY, allowNull: true },
        expiresOn: { type: DataTypes.DATEONLY, allowNull: true },
        notes: { type: DataTypes.STRING(1000), allowNull: false, defaultValue: '' },
      },
      { sequelize, tableName: 'material_lots' },
    );
  }
}
