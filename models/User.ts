import 'server-only';
import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

import { DIGEST_FREQUENCIES, ROLES, type DigestFrequency, type Role } from '@/lib/vocabulary';

export { DIGEST_FREQUENCIES, ROLES, type DigestFrequency, type Role };

export class User extends Model<InferAttributes<User>, InferCreationAttributes<User>> {
  declare id: CreationOptional<number>;
  declare handle: string;
  declare displayName: string;
  declare email: string;
  declare role: CreationOptional<Role>;
  declare region: string | null;
  declare bio: string | null;
  declare passwordHash: CreationOptional<string | null>;
  declare emailVerifiedAt: CreationOptional<Date | null>;
  declare units: CreationOptional<'US' | 'metric'>;
  declare suspendedUntil: CreationOptional<Date | null>;
  /** carried in session tokens; bumping it ends every session signed in before (lib/auth/session-version.ts) */
  declare sessionVersion: CreationOptional<number>;
  declare digestFrequency: CreationOptional<DigestFrequency>;
  declare notifyAnswers: CreationOptional<boolean>;
  declare notifyReplies: CreationOptional<boolean>;
  declare notifyFixed: CreationOptional<boolean>;
  declare notifyModeration: CreationOptional<boolean>;
  declare notifyExpert: CreationOptional<boolean>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    User.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        handle: { type: DataTypes.STRING(40), allowNull: false, unique: true },
        displayName: { type: DataTypes.STRING(80), allowNull: false },
        email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
        role: { type: DataTypes.ENUM(...ROLES), allowNull: false, defaultValue: 'member' },
        region: { type: DataTypes.STRING(80), allowNull: true },
        bio: { type: DataTypes.TEXT, allowNull: true },
        passwordHash: { type: DataTypes.STRING(255), allowNull: true },
        emailVerifiedAt: { type: DataTypes.DATE, allowNull: true },
        units: { type: DataTypes.ENUM('US', 'metric'), allowNull: false, defaultValue: 'US' },
        suspendedUntil: { type: DataTypes.DATE, allowNull: true },
        sessionVersion: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 },
        digestFrequency: { type: DataTypes.ENUM(...DIGEST_FREQUENCIES), allowNull: false, defaultValue: 'off' },
        notifyAnswers: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
        notifyReplies: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
        notifyFixed: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
        notifyModeration: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
        notifyExpert: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      {
        sequelize,
        // named here: the bundler minifies class names, and Sequelize aliases tables by model name
        modelName: 'User',
        tableName: 'users',
        // the hash never leaves the server by accident; sign-in reads it with User.unscoped()
        defaultScope: { attributes: { exclude: ['passwordHash'] } },
      },
    );
  }
}
