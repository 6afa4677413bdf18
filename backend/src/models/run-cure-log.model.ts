import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

import { deviceColumns } from './record-attributes';

/** A logged oven profile of a cure step and the dose it gave each ink (JSON: MariaDB may hand back text). */
export class RunCureLogModel extends Model<InferAttributes<RunCureLogModel>, InferCreationAttributes<RunCureLogModel>> {
  declare id: CreationOptional<number>;
  declare runId: number;
  declare stepId: string;
  declare samples: unknown;
  declare dose: unknown;
  declare recordedBy: number;
  declare recordedAt: Date;
  declare deviceTime: Date | null;
  declare madeOffline: boolean;

  static initModel(sequelize: Sequelize) {
    RunCureLogModel.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        runId: { type: DataTypes.INTEGER, allowNull: false },
        stepId: { type: DataTypes.STRING(40), allowNull: false },
        samples: { type: DataTypes.JSON, allowNull: false },
        dose: { type: DataTypes.JSON, allowNull: false },
        recordedBy: { type: DataTypes.INTEGER, allowNull: false },
        recordedAt: { type: DataTypes.DATE(3), allowNull: false },
        ...deviceColumns(),
      },
      { sequelize, tableName: 'run_cure_logs', timestamps: false },
    );
  }
}
