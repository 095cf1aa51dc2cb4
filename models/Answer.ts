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
import type { Question } from './Question';

export class Answer extends Model<InferAttributes<Answer>, InferCreationAttributes<Answer>> {
  declare id: CreationOptional<number>;
  declare questionId: ForeignKey<Question['id']>;
  declare authorId: ForeignKey<User['id']>;
  declare body: string;
  declare helpfulCount: CreationOptional<number>;
  declare calculationId: CreationOptional<number | null>;
  declare hiddenAt: CreationOptional<Date | null>;
  declare hiddenReason: CreationOptional<string | null>;
  declare deletedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  declare author?: NonAttribute<User>;

  static initModel(sequelize: Sequelize) {
    Answer.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        body: { type: DataTypes.TEXT('medium'), allowNull: false },
        helpfulCount: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 },
        calculationId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        hiddenAt: { type: DataTypes.DATE, allowNull: true },
        hiddenReason: { type: DataTypes.STRING(1000), allowNull: true },
        deletedAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, modelName: 'Answer' /* the bundler minifies class names */, tableName: 'answers' },
    );
  }
}
