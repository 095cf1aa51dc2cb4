import 'server-only';
import {
  DataTypes,
  Model,
  type CreationOptional,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import type { Site } from './Site';

/** One survey of a site as typed, with the plan the engine made of it. Never changed once saved. */
export class SiteVersion extends Model<InferAttributes<SiteVersion>, InferCreationAttributes<SiteVersion>> {
  declare id: CreationOptional<number>;
  declare siteId: ForeignKey<Site['id']>;
  declare version: number;
  declare survey: Record<string, string>;
  declare plan: Record<string, unknown>;
  declare engineVersion: string;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    SiteVersion.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        version: { type: DataTypes.SMALLINT.UNSIGNED, allowNull: false },
        survey: { type: DataTypes.JSON, allowNull: false },
        plan: { type: DataTypes.JSON, allowNull: false },
        engineVersion: { type: DataTypes.STRING(20), allowNull: false },
        createdAt: DataTypes.DATE,
      },
      {
        sequelize,
        modelName: 'SiteVersion' /* the bundler minifies class names */,
        tableName: 'site_versions',
        updatedAt: false,
      },
    );
  }
}
