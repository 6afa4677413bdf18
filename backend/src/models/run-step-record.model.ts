import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

import type { StepRecordState } from '@tracewright/shared';

/** Where one step of a run stands; one row per step, made when the run is planned. */
export class RunStepRecordModel extends Model<InferAttributes<RunStepRecordModel>, InferCreationAttributes<RunStepRecordModel>> {
  declare id: CreationOptional<number>;
  declare runId: number;
  declare stepId: string;
  declare state: StepRecordState;
  declare safetyAcknowledgedBy: CreationOptional<number | null>;
  declare safetyAcknowledgedAt: CreationOptional<Date | null>;
  declare startedBy: CreationOptional<number | null>;
  declare startedAt: CreationOptional<Date | null>;
  declare completedBy: CreationOptional<number | null>;
  declare completedAt: CreationOptional<Date | null>;
  declare notDoneReason: CreationOptional<string | null>;
  declare note: CreationOptional<string>;
  declare hasDeviceTime: CreationOptional<boolean>;
  /** Outside a rework run's scope: settled as not done at planning, without a deviation. */
  declare notNeeded: CreationOptional<boolean>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    const person = () => ({ type: DataTypes.INTEGER, allowNull: true });
    const at = () => ({ type: DataTypes.DATE(3), allowNull: true });
    RunStepRecordModel.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        runId: { type: DataTypes.INTEGER, allowNull: false },
        stepId: { type: DataTypes.STRING(40), allowNull: false },
        state: { type: DataTypes.STRING(20), allowNull: false },
        safetyAcknowledgedBy: person(),
        safetyAcknowledgedAt: at(),
        startedBy: person(),
        startedAt: at(),
        completedBy: person(),
        completedAt: at(),
        notDoneReason: { type: DataTypes.STRING(1000), allowNull: true },
        note: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        hasDeviceTime: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        notNeeded: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'run_step_records' },
    );
  }
}
