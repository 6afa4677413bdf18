import { DataTypes, Model, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** A single row (id 1): the lab's name, time zone and paper size for printed travellers. */
export class LabSettingsModel extends Model<
  InferAttributes<LabSettingsModel>,
  InferCreationAttributes<LabSettingsModel>
> {
  declare id: number;
  declare labName: string;
  declare timeZone: string;
  declare paperSize: 'A4' | 'Letter';
  declare updatedAt: Date;

  static initModel(sequelize: Sequelize) {
    LabSettingsModel.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true },
        labName: { type: DataTypes.STRING(120), allowNull: false },
        timeZone: { type: DataTypes.STRING(64), allowNull: false },
        paperSize: { type: DataTypes.ENUM('A4', 'Letter'), allowNull: false },
        updatedAt: { type: DataTypes.DATE(3), allowNull: false },
      },
      { sequelize, tableName: 'lab_settings', createdAt: false, updatedAt: false },
    );
  }
}
