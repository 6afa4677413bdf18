import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

import type { DeviationRule, DeviationSummary, StepKind } from '@tracewright/shared';

/**
 * A departure from the recipe (migrations 0011, 0013). Id lists are JSON: read them through
 * parseJsonColumn. recipeId and stepKind are copies for the queue's indexes; `revision` goes up
 * with every change of state, and is part of the record a signer's content hash covers.
 */
export class DeviationModel extends Model<InferAttributes<DeviationModel>, InferCreationAttributes<DeviationModel>> {
  declare id: CreationOptional<number>;
  declare runId: number;
  declare recipeId: number;
  declare stepId: string | null;
  declare stepKind: StepKind | null;
  declare rule: DeviationRule;
  declare severity: DeviationSummary['severity'];
  declare state: CreationOptional<DeviationSummary['state']>;
  declare title: string;
  declare expected: string;
  declare actual: string;
  declare pieceIds: unknown;
  declare photoFileIds: unknown;
  declare sourceType: string | null;
  declare sourceId: number | null;
  declare createdBy: number | null;
  declare createdAt: Date;
  declare updatedAt: Date;
  declare assigneeId: CreationOptional<number | null>;
  declare assignedAt: CreationOptional<Date | null>;
  declare revision: CreationOptional<number>;
  declare dispositionedAt: CreationOptional<Date | null>;
  declare closedAt: CreationOptional<Date | null>;
  declare closedBy: CreationOptional<number | null>;
  declare closureNote: CreationOptional<string | null>;
  declare closureSignatureId: CreationOptional<number | null>;

  static initModel(sequelize: Sequelize) {
    DeviationModel.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        runId: { type: DataTypes.INTEGER, allowNull: false },
        recipeId: { type: DataTypes.INTEGER, allowNull: false },
        stepId: { type: DataTypes.STRING(40), allowNull: true },
        stepKind: { type: DataTypes.STRING(30), allowNull: true },
        rule: { type: DataTypes.STRING(40), allowNull: false },
        severity: { type: DataTypes.STRING(10), allowNull: false },
        state: { type: DataTypes.STRING(20), allowNull: false, defaultValue: 'open' },
        title: { type: DataTypes.STRING(400), allowNull: false },
        expected: { type: DataTypes.TEXT, allowNull: false },
        actual: { type: DataTypes.TEXT, allowNull: false },
        pieceIds: { type: DataTypes.JSON, allowNull: false },
        photoFileIds: { type: DataTypes.JSON, allowNull: false },
        sourceType: { type: DataTypes.STRING(30), allowNull: true },
        sourceId: { type: DataTypes.INTEGER, allowNull: true },
        createdBy: { type: DataTypes.INTEGER, allowNull: true },
        // Set from ctx.clock by the service (not Sequelize's own clock), so tests can move time.
        createdAt: { type: DataTypes.DATE(3), allowNull: false },
        updatedAt: { type: DataTypes.DATE(3), allowNull: false },
        assigneeId: { type: DataTypes.INTEGER, allowNull: true },
        assignedAt: { type: DataTypes.DATE(3), allowNull: true },
        revision: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
        dispositionedAt: { type: DataTypes.DATE(3), allowNull: true },
        closedAt: { type: DataTypes.DATE(3), allowNull: true },
        closedBy: { type: DataTypes.INTEGER, allowNull: true },
        closureNote: { type: DataTypes.TEXT, allowNull: true },
        closureSignatureId: { type: DataTypes.INTEGER, allowNull: true },
      },
      { sequelize, tableName: 'deviations', timestamps: false },
    );
  }
}
