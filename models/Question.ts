import 'server-only';
import {
  DataTypes,
  Model,
  type CreationOptional,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from 'sequelize';
import type { User } from './User';
import type { Tag } from './Tag';
import type { Site } from './Site';

export class Question extends Model<InferAttributes<Question>, InferCreationAttributes<Question>> {
  declare id: CreationOptional<number>;
  declare authorId: ForeignKey<User['id']>;
  declare title: string;
  declare body: string;
  /** Denormalised count so lists need no join; kept in step by the code that adds answers. */
  declare answerCount: CreationOptional<number>;
  declare fixedAnswerId: number | null;
  /** the asker's one line saying what fixed it, saved with fixedAnswerId */
  declare whatFixedIt: CreationOptional<string | null>;
  /** the site sheet as the asker typed it (stall-check form fields with their units) */
  declare siteSheet: CreationOptional<Record<string, string> | null>;
  declare helpfulCount: CreationOptional<number>;
  declare guideSlug: CreationOptional<string | null>;
  declare lastActivityAt: CreationOptional<Date | null>;
  declare hiddenAt: CreationOptional<Date | null>;
  declare hiddenReason: CreationOptional<string | null>;
  declare deletedAt: CreationOptional<Date | null>;
  declare lockedAt: CreationOptional<Date | null>;
  /** the field log entry the site sheet was filled from, if any */
  declare fieldLogEntryId: CreationOptional<number | null>;
  /** the site it is about (sites.ts), set by its association */
  declare siteId?: ForeignKey<number> | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  declare author?: NonAttribute<User>;
  declare tags?: NonAttribute<Tag[]>;
  declare site?: NonAttribute<Site | null>;

  static initModel(sequelize: Sequelize) {
    Question.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        title: { type: DataTypes.STRING(160), allowNull: false },
        body: { type: DataTypes.TEXT('medium'), allowNull: false },
        answerCount: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 },
        fixedAnswerId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        whatFixedIt: { type: DataTypes.STRING(140), allowNull: true },
        siteSheet: { type: DataTypes.JSON, allowNull: true },
        helpfulCount: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 },
        guideSlug: { type: DataTypes.STRING(80), allowNull: true },
        lastActivityAt: { type: DataTypes.DATE, allowNull: true },
        hiddenAt: { type: DataTypes.DATE, allowNull: true },
        hiddenReason: { type: DataTypes.STRING(1000), allowNull: true },
        deletedAt: { type: DataTypes.DATE, allowNull: true },
        lockedAt: { type: DataTypes.DATE, allowNull: true },
        fieldLogEntryId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, modelName: 'Question' /* the bundler minifies class names */, tableName: 'questions' },
    );
  }
}
