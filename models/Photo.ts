import 'server-only';
import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/** An uploaded photo: stored outside public/ under `publicId`, metadata stripped. */
export class Photo extends Model<InferAttributes<Photo>, InferCreationAttributes<Photo>> {
  declare id: CreationOptional<number>;
  declare publicId: string;
  declare ownerId: number;
  declare questionId: number | null;
  declare answerId: number | null;
  declare fieldLogEntryId: CreationOptional<number | null>;
  declare mime: string;
  declare width: number;
  declare height: number;
  declare bytes: number;
  declare alt: string | null;
  declare hiddenAt: CreationOptional<Date | null>;
  declare hiddenReason: CreationOptional<string | null>;
  declare deletedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    Photo.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        publicId: { type: DataTypes.STRING(24), allowNull: false, unique: true },
        ownerId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        questionId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        answerId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        fieldLogEntryId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        mime: { type: DataTypes.STRING(40), allowNull: false },
        width: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        height: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        bytes: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        alt: { type: DataTypes.STRING(200), allowNull: true },
        hiddenAt: { type: DataTypes.DATE, allowNull: true },
        hiddenReason: { type: DataTypes.STRING(1000), allowNull: true },
        deletedAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
      },
      { sequelize, modelName: 'Photo' /* the bundler minifies class names */, tableName: 'photos', updatedAt: false },
    );
  }
}
