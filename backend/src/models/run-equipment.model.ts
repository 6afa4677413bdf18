import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

import type { EQUIPMENT_KINDS } from '@tracewright/shared';

export type EquipmentKind = (typeof EQUIPMENT_KINDS)[number];

/** A machine a run uses; `replacesId` is the version's machine of the same kind it stands in for. */
export class RunEquipmentModel extends Model<InferAttributes<RunEquipmentModel>, InferCreationAttributes<RunEquipmentModel>> {
  declare id: CreationOptional<number>;
  declare runId: number;
  declare kind: EquipmentKind;
  declare equipmentId: number;
  declare replacesId: number | null;
  declare reason: string | null;

  static initModel(sequelize: Sequelize) {
    RunEquipmentModel.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        runId: { type: DataTypes.INTEGER, allowNull: false },
        kind: { type: DataTypes.STRING(20), allowNull: false },
        equipmentId: { type: DataTypes.INTEGER, allowNull: false },
        replacesId: { type: DataTypes.INTEGER, allowNull: true },
        reason: { type: DataTypes.STRING(1000), allowNull: true },
      },
      { sequelize, tableName: 'run_equipment', timestamps: false },
    );
  }
}
