import 'server-only';
import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/** Two entries on one site linked as before and after, with what changed between them. */
export class FieldLogLink extends Model<InferAttributes<FieldLogLink>, InferCreationAttributes<FieldLogLink>> {
  declare id: CreationOptional<number>;
  declare beforeId: number;
  declare afterId: number;
  declare whatChanged: string;
  declare createdBy: number;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    FieldLogLink.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        beforeId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        afterId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        whatChanged: { type: DataTypes.STRING(300), allowNull: false },
        createdBy: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        createdAt: DataTypes.DATE,
      },
      { sequelize, modelName: 'FieldLogLink', tableName: 'field_log_links', underscored: true, updatedAt: false },
    );
  }
}
