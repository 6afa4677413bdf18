import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/** A reading taken during a run. Kept as taken (triggers of migration 0010); a correction adds a row. */
export class RunReadingModel extends Model<InferAttributes<RunReadingModel>, InferCreationAttributes<RunReadingModel>> {
  declare id: CreationOptional<number>;
  declare runId: number;
  declare stepId: string;
  declare specId: string;
  declare pieceId: number | null;
  declare value: number;
  declare unit: string;
  declare correctedValue: number | null;
  declare ambientTempC: number | null;
  declare instrumentId: number | null;
  declare outOfLimits: boolean;
  declare supersededById: CreationOptional<number | null>;
  declare correctionReason: CreationOptional<string | null>;
  declare recordedBy: number;
  declare recordedAt: Date;
  declare deviceTime: Date | null;
  declare madeOffline: boolean;

  static initModel(sequelize: Sequelize) {
    const ref = () => ({ type: DataTypes.INTEGER, allowNull: true });
    RunReadingModel.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        runId: { type: DataTypes.INTEGER, allowNull: false },
        stepId: { type: DataTypes.STRING(40), allowNull: false },
        specId: { type: DataTypes.STRING(40), allowNull: false },
        pieceId: ref(),
        value: { type: DataTypes.DOUBLE, allowNull: false },
        unit: { type: DataTypes.STRING(20), allowNull: false },
        correctedValue: { type: DataTypes.DOUBLE, allowNull: true },
        ambientTempC: { type: DataTypes.DOUBLE, allowNull: true },
        instrumentId: ref(),
        outOfLimits: { type: DataTypes.BOOLEAN, allowNull: false },
        supersededById: ref(),
        correctionReason: { type: DataTypes.STRING(1000), allowNull: true },
        recordedBy: { type: DataTypes.INTEGER, allowNull: false },
        recordedAt: { type: DataTypes.DATE(3), allowNull: false },
        deviceTime: { type: DataTypes.DATE(3), allowNull: true },
        madeOffline: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
      },
      { sequelize, tableName: 'run_readings', timestamps: false },
    );
  }
}
