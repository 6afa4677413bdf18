import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/** A timer an operator ran at a step; running while `stoppedAt` is null. */
export class RunTimerModel extends Model<InferAttributes<RunTimerModel>, InferCreationAttributes<RunTimerModel>> {
  declare id: CreationOptional<number>;
  declare runId: number;
  declare stepId: string;
  declare label: string;
  declare plannedSeconds: number;
  declare startedAt: Date;
  declare startedOnDeviceClock: boolean;
  declare startedBy: number;
  declare stoppedAt: CreationOptional<Date | null>;
  declare stoppedOnDeviceClock: CreationOptional<boolean>;
  declare stoppedBy: CreationOptional<number | null>;
  declare stopReason: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    RunTimerModel.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        runId: { type: DataTypes.INTEGER, allowNull: false },
        stepId: { type: DataTypes.STRING(40), allowNull: false },
        label: { type: DataTypes.STRING(80), allowNull: false },
        plannedSeconds: { type: DataTypes.DOUBLE, allowNull: false },
        startedAt: { type: DataTypes.DATE(3), allowNull: false },
        startedOnDeviceClock: { type: DataTypes.BOOLEAN, allowNull: false },
        startedBy: { type: DataTypes.INTEGER, allowNull: false },
        stoppedAt: { type: DataTypes.DATE(3), allowNull: true },
        stoppedOnDeviceClock: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        stoppedBy: { type: DataTypes.INTEGER, allowNull: true },
        stopReason: { type: DataTypes.STRING(1000), allowNull: true },
        createdAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'run_timers', updatedAt: false },
    );
  }
}
