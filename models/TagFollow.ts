import 'server-only';
import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/** A member follows a tag: its new questions go in their digest (and, for an expert, its unanswered ones). */
export class TagFollow extends Model<InferAttributes<TagFollow>, InferCreationAttributes<TagFollow>> {
  declare userId: number;
  declare tagId: number;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    TagFollow.init(
      {
        userId: { type: DataTypes.INTEGER.UNSIGNED, primaryKey: true },
        tagId: { type: DataTypes.INTEGER.UNSIGNED, primaryKey: true },
        createdAt: DataTypes.DATE,
      },
      {
        sequelize,
        modelName: 'TagFollow' /* the bundler minifies class names */,
        tableName: 'tag_follows',
        updatedAt: false,
      },
    );
  }
}
