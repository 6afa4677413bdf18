import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/** A note on one trend point; the newest per reading is in force. Append-only (migration 0017). */
export class TrendPointNoteModel extends Model<InferAttributes<TrendPointNoteModel>, InferCreationAttributes<TrendPointNoteModel>> {
  declare id: CreationOptional<number>;
  declare readingId: number;
  declare excluded: boolean;
  declare reason: string;
  declare byId: number;
  declare at: Date;

  static initModel(sequelize: Sequelize) {
    TrendPointNoteModel.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        readingId: { type: DataTypes.INTEGER, allowNull: false },
        excluded: { type: DataTypes.BOOLEAN, allowNull: false },
        reason: { type: DataTypes.STRING(1000), allowNull: false },
        byId: { type: DataTypes.INTEGER, allowNull: false },
        at: { type: DataTypes.DATE(3), allowNull: false },
      },
      { sequelize, tableName: 'trend_point_notes', timestamps: false },
    );
  }
}
