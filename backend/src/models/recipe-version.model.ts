import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

import type { VersionState } from '@tracewright/shared';

/**
 * One version of a recipe. `content` is DraftContent as JSON (MariaDB may hand it back as text:
 * read it through `versionContent`). The generated open/released slot columns of migration 0006
 * are left out on purpose: the database computes them.
 */
export class RecipeVersionModel extends Model<InferAttributes<RecipeVersionModel>, InferCreationAttributes<RecipeVersionModel>> {
  declare id: CreationOptional<number>;
  declare recipeId: number;
  declare number: number;
  declare state: VersionState;
  declare content: unknown;
  declare lockVersion: CreationOptional<number>;
  declare contentHash: string;
  declare authorId: number;
  declare submittedBy: CreationOptional<number | null>;
  declare submittedAt: CreationOptional<Date | null>;
  declare releasedBy: CreationOptional<number | null>;
  declare releasedAt: CreationOptional<Date | null>;
  declare retiredAt: CreationOptional<Date | null>;
  declare reviewComment: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    const person = () => ({ type: DataTypes.INTEGER, allowNull: true });
    RecipeVersionModel.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        recipeId: { type: DataTypes.INTEGER, allowNull: false },
        number: { type: DataTypes.INTEGER, allowNull: false },
        state: { type: DataTypes.STRING(20), allowNull: false },
        content: { type: DataTypes.JSON, allowNull: false },
        lockVersion: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
        contentHash: { type: DataTypes.CHAR(64), allowNull: false },
        authorId: { type: DataTypes.INTEGER, allowNull: false },
        submittedBy: person(),
        submittedAt: { type: DataTypes.DATE(3), allowNull: true },
        releasedBy: person(),
        releasedAt: { type: DataTypes.DATE(3), allowNull: true },
        retiredAt: { type: DataTypes.DATE(3), allowNull: true },
        reviewComment: { type: DataTypes.TEXT, allowNull: true },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'recipe_versions' },
    );
  }
}
