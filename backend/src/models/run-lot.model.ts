import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** A lot a run uses; `reason` says why a flagged lot was used anyway. */
export class RunLotModel extends Model<InferAttributes<RunLotModel>, InferCreationAttributes<RunLotModel>> {
  declare id: CreationOptional<number>;
  declare runId: number;
  declare lotId: number;
  declare reason: string | null;

  static initModel(sequelize: Sequelize) {
    RunLotModel.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        runId: { type: DataTypes.INTEGER, allowNull: false },
        lotId: { type: DataTypes.INTEGER, allowNull: false },
        reason: { type: DataTypes.STRING(1000), allowNull: true },
      },
      { sequelize, tableName: 'run_lots', timestamps: false },
    );
  }
}
