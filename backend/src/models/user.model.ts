import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

import type { Role, UserStatus } from '@tracewright/shared';

export class UserModel extends Model<InferAttributes<UserModel>, InferCreationAttributes<UserModel>> {
  declare id: CreationOptional<number>;
  declare email: string;
  declare name: string;
  declare role: Role;
  declare status: CreationOptional<UserStatus>;
  declare passwordHash: CreationOptional<string | null>;
  declare pinHash: CreationOptional<string | null>;
  declare tokenVersion: CreationOptional<number>;
  declare lastSignInAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    UserModel.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
        name: { type: DataTypes.STRING(120), allowNull: false },
        role: { type: DataTypes.ENUM('admin', 'engineer', 'operator', 'quality'), allowNull: false },
        status: { type: DataTypes.ENUM('invited', 'active', 'deactivated'), allowNull: false, defaultValue: 'invited' },
        passwordHash: { type: DataTypes.STRING(255), allowNull: true },
        pinHash: { type: DataTypes.STRING(255), allowNull: true },
        tokenVersion: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
        lastSignInAt: { type: DataTypes.DATE(3), allowNull: true },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'users' },
    );
  }
}
