import 'server-only';
import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

export class QuestionFollow extends Model<InferAttributes<QuestionFollow>, InferCreationAttributes<QuestionFollow>> {
  declare questionId: number;
  declare userId: number;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    QuestionFollow.init(
      {
        questionId: { type: DataTypes.INTEGER.UNSIGNED, primaryKey: true },
        userId: { type: DataTypes.INTEGER.UNSIGNED, primaryKey: true },
        createdAt: DataTypes.DATE,
      },
      {
        sequelize,
        modelName: 'QuestionFollow' /* the bundler minifies class names */,
        tableName: 'question_follows',
        updatedAt: false,
      },
    );
  }
}
