import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** A tablet write's Idempotency-Key with the answer it got (migration 0012). */
export class IdempotencyKeyModel extends Model<InferAttributes<IdempotencyKeyModel>, InferCreationAttributes<IdempotencyKeyModel>> {
  declare id: CreationOptional<number>;
  declare userId: number;
  declare idempotencyKey: string;
  declare method: string;
  declare path: string;
  declare requestHash: string;
  /** Null only inside the writing transaction, before the answer is known. */
  declare statusCode: number | null;
  declare responseBody: unknown;
  declare createdAt: Date;

  static initModel(sequelize: Sequelize) {
    IdempotencyKeyModel.init(
      {
        id: { type: DataTypes.BIGINT, autoIncrement: true, primaryKey: true },
        userId: { type: DataTypes.INTEGER, allowNull: false },
        idempotencyKey: { type: DataTypes.STRING(100), allowNull: false },
        method: { type: DataTypes.STRING(10), allowNull: false },
        path: { type: DataTypes.STRING(300), allowNull: false },
        requestHash: { type: DataTypes.CHAR(64), allowNull: false },
        statusCode: { type: DataTypes.INTEGER, allowNull: true },
        responseBody: { type: DataTypes.JSON, allowNull: true },
        createdAt: { type: DataTypes.DATE(3), allowNull: false },
      },
      { sequelize, tableName: 'idempotency_keys', timestamps: false },
    );
  }
}
