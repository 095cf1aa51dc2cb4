import 'server-only';
import { DataTypes, Model, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export class QuestionTag extends Model<InferAttributes<QuestionTag>, InferCreationAttributes<QuestionTag>> {
  declare questionId: number;
  declare tagId: number;

  static initModel(sequelize: Sequelize) {
    QuestionTag.init(
      {
        questionId: { type: DataTypes.INTEGER.UNSIGNED, primaryKey: true },
        tagId: { type: DataTypes.INTEGER.UNSIGNED, primaryKey: true },
      },
      {
        sequelize,
        modelName: 'QuestionTag' /* the bundler minifies class names */,
        tableName: 'question_tags',
        timestamps: false,
      },
    );
  }
}
