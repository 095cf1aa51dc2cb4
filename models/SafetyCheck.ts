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

import { SAFETY_VERDICTS, type SafetyVerdict } from '@/lib/vocabulary';

export { SAFETY_VERDICTS, type SafetyVerdict };

/** An expert's sign-off on one version (content hash) of one guide. */
export class SafetyCheck extends Model<InferAttributes<SafetyCheck>, InferCreationAttributes<SafetyCheck>> {
  declare id: CreationOptional<number>;
  declare guideSlug: string;
  declare contentHash: string;
  declare expertId: ForeignKey<User['id']>;
  declare verdict: SafetyVerdict;
  declare notes: string | null;
  /** The guide file the expert read, whole; null for checks older than migration 013. */
  declare checkedText: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  declare expert?: NonAttribute<User>;

  static initModel(sequelize: Sequelize) {
    SafetyCheck.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        guideSlug: { type: DataTypes.STRING(80), allowNull: false },
        contentHash: { type: DataTypes.CHAR(64), allowNull: false },
        verdict: { type: DataTypes.ENUM(...SAFETY_VERDICTS), allowNull: false },
        notes: { type: DataTypes.TEXT, allowNull: true },
        checkedText: { type: DataTypes.TEXT('medium'), allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, modelName: 'SafetyCheck' /* the bundler minifies class names */, tableName: 'safety_checks' },
    );
  }
}
