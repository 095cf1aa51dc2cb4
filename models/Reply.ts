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

/** A threaded reply under a question or an answer; `depth` is capped, deeper replies flatten. */
export class Reply extends Model<InferAttributes<Reply>, InferCreationAttributes<Reply>> {
  declare id: CreationOptional<number>;
  declare questionId: number;
  declare parentType: 'question' | 'answer';
  declare answerId: number | null;
  declare replyToId: number | null;
  declare depth: CreationOptional<number>;
  declare authorId: number;
  declare body: string;
  declare helpfulCount: CreationOptional<number>;
  declare hiddenAt: CreationOptional<Date | null>;
  declare hiddenReason: CreationOptional<string | null>;
  declare deletedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  declare author?: NonAttribute<User>;

  static initModel(sequelize: Sequelize) {
    Reply.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        questionId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        parentType: { type: DataTypes.ENUM('question', 'answer'), allowNull: false },
        answerId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        replyToId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        depth: { type: DataTypes.TINYINT.UNSIGNED, allowNull: false, defaultValue: 0 },
        authorId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        body: { type: DataTypes.TEXT, allowNull: false },
        helpfulCount: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 },
        hiddenAt: { type: DataTypes.DATE, allowNull: true },
        hiddenReason: { type: DataTypes.STRING(1000), allowNull: true },
        deletedAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, modelName: 'Reply' /* the bundler minifies class names */, tableName: 'replies' },
    );
  }
}
