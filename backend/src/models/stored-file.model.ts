import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/** Metadata of a file kept in object storage; the key is ours, never the client's file name. */
export class StoredFileModel extends Model<InferAttributes<StoredFileModel>, InferCreationAttributes<StoredFileModel>> {
  declare id: CreationOptional<number>;
  declare storageKey: string;
  declare displayName: string;
  declare contentType: string;
  declare sizeBytes: number;
  declare sha256: string;
  declare uploadedBy: number | null;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    StoredFileModel.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        storageKey: { type: DataTypes.STRING(200), allowNull: false, unique: true },
        displayName: { type: DataTypes.STRING(200), allowNull: false },
        contentType: { type: DataTypes.STRING(100), allowNull: false },
        sizeBytes: { type: DataTypes.INTEGER, allowNull: false },
        sha256: { type: DataTypes.CHAR(64), allowNull: false },
        uploadedBy: { type: DataTypes.INTEGER, allowNull: true },
        createdAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'stored_files', updatedAt: false },
    );
  }
}
