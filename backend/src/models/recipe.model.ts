import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

import { notes, recordAttributes } from './record-attributes';

/** A product's recipe: its code and names; the process itself lives in its versions. */
export class RecipeModel extends Model<InferAttributes<RecipeModel>, InferCreationAttributes<RecipeModel>> {
  declare id: CreationOptional<number>;
  declare code: string;
  declare name: string;
  declare product: string;
  declare notes: string;
  declare createdBy: number | null;
  declare version: CreationOptional<number>;
  declare archived: CreationOptional<boolean>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    RecipeModel.init(
      {
        ...recordAttributes(),
        code: { type: DataTypes.STRING(30), allowNull: false, unique: true },
        name: { type: DataTypes.STRING(120), allowNull: false },
        product: { type: DataTypes.STRING(120), allowNull: false },
        notes: notes(),
        createdBy: { type: DataTypes.INTEGER, allowNull: true },
      },
      { sequelize, tableName: 'recipes' },
    );
  }
}
