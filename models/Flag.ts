import 'server-only';
import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from 'sequelize';
import type { User } from './User';

import {
  FLAG_REASONS,
  MODERATED_TYPES as FLAG_POST_TYPES,
  type FlagReason,
  type ModeratedType as FlagPostType,
} from '@/lib/vocabulary';

export { FLAG_POST_TYPES, FLAG_REASONS, type FlagPostType, type FlagReason };

/** A member's flag on a post, open until a moderator dismisses or upholds it. */
export class Flag extends Model<InferAttributes<Flag>, InferCreationAttributes<Flag>> {
  declare id: CreationOptional<number>;
  declare postType: FlagPostType;
  declare postId: number;
  declare flaggerId: number;
  declare reason: FlagReason;
  declare note: string | null;
  declare status: CreationOptional<'open' | 'dismissed' | 'upheld'>;
  declare resolvedBy: CreationOptional<number | null>;
  declare resolvedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;

  declare flagger?: NonAttribute<User>;

  static initModel(sequelize: Sequelize) {
    Flag.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        postType: { type: DataTypes.ENUM(...FLAG_POST_TYPES), allowNull: false },
        postId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        flaggerId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        reason: { type: DataTypes.ENUM(...FLAG_REASONS), allowNull: false },
        note: { type: DataTypes.STRING(1000), allowNull: true },
        status: { type: DataTypes.ENUM('open', 'dismissed', 'upheld'), allowNull: false, defaultValue: 'open' },
        resolvedBy: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        resolvedAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
      },
      { sequelize, modelName: 'Flag' /* the bundler minifies class names */, tableName: 'flags', updatedAt: false },
    );
  }
}
