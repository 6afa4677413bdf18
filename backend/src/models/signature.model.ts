import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

import type { QualitySignatureMeaning, SignatureMeaning } from '@tracewright/shared';

/** An e-signature row; append-only (triggers of migration 0007). Recipe releases and quality's decisions each carry their own meaning. */
export class SignatureModel extends Model<InferAttributes<SignatureModel>, InferCreationAttributes<SignatureModel>> {
  declare id: CreationOptional<number>;
  declare userId: number;
  declare printedName: string;
  declare meaning: SignatureMeaning | QualitySignatureMeaning;
  declare signedAt: Date;
  declare entityType: string;
  declare entityId: number;
  declare contentHash: string;

  static initModel(sequelize: Sequelize) {
    SignatureModel.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        userId: { type: DataTypes.INTEGER, allowNull: false },
        printedName: { type: DataTypes.STRING(120), allowNull: false },
        meaning: { type: DataTypes.STRING(60), allowNull: false },
        signedAt: { type: DataTypes.DATE(3), allowNull: false },
        entityType: { type: DataTypes.STRING(40), allowNull: false },
        entityId: { type: DataTypes.INTEGER, allowNull: false },
        contentHash: { type: DataTypes.CHAR(64), allowNull: false },
      },
      { sequelize, tableName: 'signatures', timestamps: false },
    );
  }
}
