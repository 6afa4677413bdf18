import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

export class AuditEventModel extends Model<InferAttributes<AuditEventModel>, InferCreationAttributes<AuditEventModel>> {
  declare id: CreationOptional<number>;
  declare at: Date;
  declare actorId: number | null;
  declare action: string;
  declare entityType: string;
  declare entityId: string | null;
  declare beforeJson: unknown;
  declare afterJson: unknown;
  declare reason: string | null;
  declare ip: string | null;

  static initModel(sequelize: Sequelize) {
    AuditEventModel.init(
      {
        id: { type: DataTypes.BIGINT, autoIncrement: true, primaryKey: true },
        at: { type: DataTypes.DATE(3), allowNull: false },
        actorId: { type: DataTypes.INTEGER, allowNull: true },
        action: { type: DataTypes.STRING(60), allowNull: false },
        entityType: { type: DataTypes.STRING(60), allowNull: false },
        entityId: { type: DataTypes.STRING(60), allowNull: true },
        beforeJson: { type: DataTypes.JSON, allowNull: true },
        afterJson: { type: DataTypes.JSON, allowNull: true },
        reason: { type: DataTypes.STRING(1000), allowNull: true },
        ip: { type: DataTypes.STRING(64), allowNull: true },
      },
      { sequelize, tableName: 'audit_events', timestamps: false },
    );
  }
}
