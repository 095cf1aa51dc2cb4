import 'server-only';
import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from 'sequelize';
import type { User } from './User';

import { POST_TYPES, type PostType } from '@/lib/vocabulary';

export { POST_TYPES, type PostType };

/** The text of a post as it was before an edit (or as first posted). */
export class Revision extends Model<InferAttributes<Revision>, InferCreationAttributes<Revision>> {
  declare id: CreationOptional<number>;
  declare postType: PostType;
  declare postId: number;
  declare editorId: number;
  declare title: string | null;
  declare body: string;
  declare createdAt: CreationOptional<Date>;

  declare editor?: NonAttribute<User>;

  static initModel(sequelize: Sequelize) {
    Revision.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        postType: { type: DataTypes.ENUM(...POST_TYPES), allowNull: false },
        postId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        editorId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        title: { type: DataTypes.STRING(160), allowNull: true },
        body: { type: DataTypes.TEXT('medium'), allowNull: false },
        createdAt: DataTypes.DATE,
      },
      {
        sequelize,
        modelName: 'Revision' /* the bundler minifies class names */,
        tableName: 'revisions',
        updatedAt: false,
      },
    );
  }
}
