import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** One piece of a run, numbered from 1, with its printed code (e.g. R-2026-0007-03). */
export class RunPieceModel extends Model<InferAttributes<RunPieceModel>, InferCreationAttributes<RunPieceModel>> {
  declare id: CreationOptional<number>;
  declare runId: number;
  declare number: number;
  declare code: string;
  /** On a rework run: the piece of the original run this one is (migration 0015). */
  declare reworkOfPieceId: CreationOptional<number | null>;

  static initModel(sequelize: Sequelize) {
    RunPieceModel.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        runId: { type: DataTypes.INTEGER, allowNull: false },
        number: { type: DataTypes.INTEGER, allowNull: false },
        code: { type: DataTypes.STRING(30), allowNull: false },
        reworkOfPieceId: { type: DataTypes.INTEGER, allowNull: true },
      },
      { sequelize, tableName: 'run_pieces', timestamps: false },
    );
  }
}
