import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

import { deviceColumns } from './record-attributes';

/** The operator scanned or ticked the lot in hand at a step: it is the one the run planned. */
export class RunLotConfirmationModel extends Model<InferAttributes<RunLotConfirmationModel>, InferCreationAttributes<RunLotConfirmationModel>> {
  declare id: CreationOptional<number>;
  declare runId: number;
  declare stepId: string;
  declare lotId: number;
  declare confirmedBy: number;
  declare confirmedAt: Date;
  declare deviceTime: Date | null;
  declare madeOffline: boolean;

  static initModel(sequelize: Sequelize) {
    RunLotConfirmationModel.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        runId: { type: DataTypes.INTEGER, allowNull: false },
        stepId: { type: DataTypes.STRING(40), allowNull: false },
        lotId: { type: DataTypes.INTEGER, allowNull: false },
        confirmedBy: { type: DataTypes.INTEGER, allowNull: false },
        confirmedAt: { type: DataTypes.DATE(3), allowNull: false },
        ...deviceColumns(),
      },
      { sequelize, tableName: 'run_lot_confirmations', timestamps: false },
    );
  }
}
