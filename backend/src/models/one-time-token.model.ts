import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

export type OneTimeTokenPurpose = 'invitation' | 'password-reset';

/** Invitation and reset links: only a SHA-256 of the token is stored, so a database leak opens nothing. */
export class OneTimeTokenModel extends Model<
  InferAttributes<OneTimeTokenModel>,
  InferCreationAttributes<OneTimeTokenModel>
> {
  declare id: CreationOptional<number>;
  declare userId: number;
  declare purpose: OneTimeTokenPurpose;
  declare tokenHash: string;
  declare expiresAt: Date;
  declare usedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    OneTimeTokenModel.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        userId: { type: DataTypes.INTEGER, allowNull: false },
        purpose: { type: DataTypes.ENUM('invitation', 'password-reset'), allowNull: false },
        tokenHash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
        expiresAt: { type: DataTypes.DATE(3), allowNull: false },
        usedAt: { type: DataTypes.DATE(3), allowNull: true },
        createdAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'one_time_tokens', updatedAt: false },
    );
  }
}
