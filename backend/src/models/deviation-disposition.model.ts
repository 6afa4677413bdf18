import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

import type { Disposition } from '@tracewright/shared';

/**
 * A signed disposition of some or all pieces of a deviation (migration 0015). Kept as signed;
 * closing the deviation adds the verification of its corrective action. Id lists are JSON.
 */
export class DeviationDispositionModel extends Model<InferAttributes<DeviationDispositionModel>, InferCreationAttributes<DeviationDispositionModel>> {
  declare id: CreationOptional<number>;
  declare deviationId: number;
  declare disposition: Disposition;
  declare rationale: string;
  declare pieceIds: unknown;
  declare reworkStepIds: unknown;
  declare reworkRunId: number | null;
  declare correctiveActionNote: string | null;
  declare correctiveActionOwnerId: number | null;
  declare correctiveActionDueOn: string | null;
  declare verifiedAt: CreationOptional<Date | null>;
  declare verifiedBy: CreationOptional<number | null>;
  declare verificationNote: CreationOptional<string | null>;
  declare signatureId: number;
  declare createdBy: number;
  declare createdAt: Date;

  static initModel(sequelize: Sequelize) {
    DeviationDispositionModel.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        deviationId: { type: DataTypes.INTEGER, allowNull: false },
        disposition: { type: DataTypes.STRING(30), allowNull: false },
        rationale: { type: DataTypes.TEXT, allowNull: false },
        pieceIds: { type: DataTypes.JSON, allowNull: false },
        reworkStepIds: { type: DataTypes.JSON, allowNull: false },
        reworkRunId: { type: DataTypes.INTEGER, allowNull: true },
        correctiveActionNote: { type: DataTypes.TEXT, allowNull: true },
        correctiveActionOwnerId: { type: DataTypes.INTEGER, allowNull: true },
        correctiveActionDueOn: { type: DataTypes.DATEONLY, allowNull: true },
        verifiedAt: { type: DataTypes.DATE(3), allowNull: true },
        verifiedBy: { type: DataTypes.INTEGER, allowNull: true },
        verificationNote: { type: DataTypes.TEXT, allowNull: true },
        signatureId: { type: DataTypes.INTEGER, allowNull: false },
        createdBy: { type: DataTypes.INTEGER, allowNull: false },
        createdAt: { type: DataTypes.DATE(3), allowNull: false },
      },
      { sequelize, tableName: 'deviation_dispositions', timestamps: false },
    );
  }
}
