import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/** Limits frozen from baseline runs; the newest per recipe and spec is in force. Append-only (migration 0017). */
export class TrendBaselineModel extends Model<InferAttributes<TrendBaselineModel>, InferCreationAttributes<TrendBaselineModel>> {
  declare id: CreationOptional<number>;
  declare recipeId: number;
  declare specId: string;
  declare runIds: unknown;
  declare mean: number;
  declare sigma: number;
  declare reason: string;
  declare byId: number;
  declare at: Date;

  static initModel(sequelize: Sequelize) {
    TrendBaselineModel.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        recipeId: { type: DataTypes.INTEGER, allowNull: false },
        specId: { type: DataTypes.STRING(40), allowNull: false },
        runIds: { type: DataTypes.JSON, allowNull: false },
        mean: { type: DataTypes.DOUBLE, allowNull: false },
        sigma: { type: DataTypes.DOUBLE, allowNull: false },
        reason: { type: DataTypes.STRING(1000), allowNull: false },
        byId: { type: DataTypes.INTEGER, allowNull: false },
        at: { type: DataTypes.DATE(3), allowNull: false },
      },
      { sequelize, tableName: 'trend_baselines', timestamps: false },
    );
  }
}
