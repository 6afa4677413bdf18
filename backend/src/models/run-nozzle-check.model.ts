import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

import { deviceColumns } from './record-attributes';

/** A nozzle check printed before a print pass; the latest one per step is the one that counts. */
export class RunNozzleCheckModel extends Model<InferAttributes<RunNozzleCheckModel>, InferCreationAttributes<RunNozzleCheckModel>> {
  declare id: CreationOptional<number>;
  declare runId: number;
  declare stepId: string;
  declare passed: boolean;
  declare photoFileId: number | null;
  declare checkedBy: number;
  declare checkedAt: Date;
  declare deviceTime: Date | null;
  declare madeOffline: boolean;

  static initModel(sequelize: Sequelize) {
    RunNozzleCheckModel.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        runId: { type: DataTypes.INTEGER, allowNull: false },
        stepId: { type: DataTypes.STRING(40), allowNull: false },
        passed: { type: DataTypes.BOOLEAN, allowNull: false },
        photoFileId: { type: DataTypes.INTEGER, allowNull: true },
        checkedBy: { type: DataTypes.INTEGER, allowNull: false },
        checkedAt: { type: DataTypes.DATE(3), allowNull: false },
        ...deviceColumns(),
      },
      { sequelize, tableName: 'run_nozzle_checks', timestamps: false },
    );
  }
}
