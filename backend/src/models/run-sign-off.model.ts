import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/** Quality's sign-off of a run's record, one per run; append-only (migration 0016). */
export class RunSignOffModel extends Model<InferAttributes<RunSignOffModel>, InferCreationAttributes<RunSignOffModel>> {
  declare id: CreationOptional<number>;
  declare runId: number;
  declare signatureId: number;
  declare signedBy: number;
  declare signedAt: Date;

  static initModel(sequelize: Sequelize) {
    RunSignOffModel.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        runId: { type: DataTypes.INTEGER, allowNull: false },
        signatureId: { type: DataTypes.INTEGER, allowNull: false },
        signedBy: { type: DataTypes.INTEGER, allowNull: false },
        signedAt: { type: DataTypes.DATE(3), allowNull: false },
      },
      { sequelize, tableName: 'run_sign_offs', timestamps: false },
    );
  }
}
