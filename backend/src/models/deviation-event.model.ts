import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/** What a deviation's history line records (DeviationEventSchema's kinds). */
export type DeviationEventKind = 'created' | 'assigned' | 'severity-changed' | 'comment' | 'dispositioned' | 'closed' | 'signature-refused';

/** One line of a deviation's history; append-only (triggers of migration 0014). */
export class DeviationEventModel extends Model<InferAttributes<DeviationEventModel>, InferCreationAttributes<DeviationEventModel>> {
  declare id: CreationOptional<number>;
  declare deviationId: number;
  declare kind: DeviationEventKind;
  declare text: string;
  declare byId: number | null;
  declare at: Date;

  static initModel(sequelize: Sequelize) {
    DeviationEventModel.init(
      {
        id: { type: DataTypes.BIGINT, autoIncrement: true, primaryKey: true },
        deviationId: { type: DataTypes.INTEGER, allowNull: false },
        kind: { type: DataTypes.STRING(30), allowNull: false },
        text: { type: DataTypes.TEXT, allowNull: false },
        byId: { type: DataTypes.INTEGER, allowNull: true },
        at: { type: DataTypes.DATE(3), allowNull: false },
      },
      { sequelize, tableName: 'deviation_events', timestamps: false },
    );
  }
}
