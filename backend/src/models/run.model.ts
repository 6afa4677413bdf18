import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

import type { RunState } from '@tracewright/shared';

/** A released recipe version made `quantity` times; its code is R-year-sequence. */
export class RunModel extends Model<InferAttributes<RunModel>, InferCreationAttributes<RunModel>> {
  declare id: CreationOptional<number>;
  declare code: string;
  declare recipeId: number;
  declare versionId: number;
  declare state: RunState;
  declare quantity: number;
  declare dueOn: string | null;
  declare notes: string;
  declare holdReason: CreationOptional<string | null>;
  declare version: CreationOptional<number>;
  /** Set on a rework run: the deviation whose disposition opened it (migration 0015). */
  declare reworkOfDeviationId: CreationOptional<number | null>;
  declare createdBy: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    RunModel.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        code: { type: DataTypes.STRING(20), allowNull: false, unique: true },
        recipeId: { type: DataTypes.INTEGER, allowNull: false },
        versionId: { type: DataTypes.INTEGER, allowNull: false },
        state: { type: DataTypes.STRING(20), allowNull: false },
        quantity: { type: DataTypes.INTEGER, allowNull: false },
        dueOn: { type: DataTypes.DATEONLY, allowNull: true },
        notes: { type: DataTypes.TEXT, allowNull: false },
        holdReason: { type: DataTypes.STRING(1000), allowNull: true },
        version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
        reworkOfDeviationId: { type: DataTypes.INTEGER, allowNull: true },
        createdBy: { type: DataTypes.INTEGER, allowNull: true },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'runs' },
    );
  }
}
