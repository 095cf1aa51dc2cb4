import 'server-only';
import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/** Something a member should know: a decision on their application, later moderation actions. */
export class Notice extends Model<InferAttributes<Notice>, InferCreationAttributes<Notice>> {
  declare id: CreationOptional<number>;
  declare userId: number;
  declare kind: string;
  declare message: string;
  declare link: string | null;
  declare readAt: Date | null;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    Notice.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        userId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        kind: { type: DataTypes.STRING(40), allowNull: false },
        message: { type: DataTypes.TEXT, allowNull: false },
        link: { type: DataTypes.STRING(300), allowNull: true },
        readAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
      },
      { sequelize, modelName: 'Notice' /* the bundler minifies class names */, tableName: 'notices', updatedAt: false },
    );
  }
}
