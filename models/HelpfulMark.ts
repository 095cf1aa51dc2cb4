import 'server-only';
import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import { POST_TYPES, type PostType } from './Revision';

/** One member's "helpful" on one post; the primary key makes it one per member. */
export class HelpfulMark extends Model<InferAttributes<HelpfulMark>, InferCreationAttributes<HelpfulMark>> {
  declare postType: PostType;
  declare postId: number;
  declare userId: number;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    HelpfulMark.init(
      {
        postType: { type: DataTypes.ENUM(...POST_TYPES), primaryKey: true },
        postId: { type: DataTypes.INTEGER.UNSIGNED, primaryKey: true },
        userId: { type: DataTypes.INTEGER.UNSIGNED, primaryKey: true },
        createdAt: DataTypes.DATE,
      },
      {
        sequelize,
        modelName: 'HelpfulMark' /* the bundler minifies class names */,
        tableName: 'helpful_marks',
        updatedAt: false,
      },
    );
  }
}
