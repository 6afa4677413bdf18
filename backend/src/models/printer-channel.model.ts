import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/** A named cartridge slot of a printer; `position` keeps the order the engineer gave. */
export class PrinterChannelModel extends Model<InferAttributes<PrinterChannelModel>, InferCreationAttributes<PrinterChannelModel>> {
  declare id: CreationOptional<number>;
  declare printerId: number;
  declare position: number;
  declare name: string;
  declare inkId: number | null;

  static initModel(sequelize: Sequelize) {
    PrinterChannelModel.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        printerId: { type: DataTypes.INTEGER, allowNull: false },
        position: { type: DataTypes.INTEGER, allowNull: false },
        name: { type: DataTypes.STRING(30), allowNull: false },
        inkId: { type: DataTypes.INTEGER, allowNull: true },
      },
      { sequelize, tableName: 'printer_channels', timestamps: false },
    );
  }
}
