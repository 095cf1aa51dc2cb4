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
import { SITE_VISIBILITIES, type SiteVisibility } from '@/lib/vocabulary';
import type { User } from './User';
import type { SiteVersion } from './SiteVersion';

/** A member's installation: its name, who may see it, and its plan's versions. */
export class Site extends Model<InferAttributes<Site>, InferCreationAttributes<Site>> {
  declare id: CreationOptional<number>;
  declare publicId: string;
  declare ownerId: ForeignKey<User['id']>;
  declare name: string;
  declare visibility: CreationOptional<SiteVisibility>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  declare owner?: NonAttribute<User>;
  declare versions?: NonAttribute<SiteVersion[]>;

  static initModel(sequelize: Sequelize) {
    Site.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        publicId: { type: DataTypes.STRING(16), allowNull: false, unique: true },
        name: { type: DataTypes.STRING(80), allowNull: false },
        visibility: { type: DataTypes.ENUM(...SITE_VISIBILITIES), allowNull: false, defaultValue: 'private' },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, modelName: 'Site' /* the bundler minifies class names */, tableName: 'sites' },
    );
  }
}
