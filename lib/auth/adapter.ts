import 'server-only';
import SequelizeAdapter, { models as adapterModels } from '@next-auth/sequelize-adapter';
import { DataTypes, type Sequelize } from 'sequelize';

/**
 * next-auth's Sequelize adapter over our own tables. Its "user" is a view of the
 * `users` table (name ↔ display_name, emailVerified ↔ email_verified_at); the other
 * three models are the adapter's own, on tables migration 004 creates. `synchronize`
 * is off: migrations own the schema.
 */
export function clackwaterAdapter(sequelize: Sequelize) {
  const opts = { underscored: true, timestamps: false } as const;
  const models = sequelize.models;
  const User =
    models.auth_user ??
    sequelize.define(
      'auth_user',
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, primaryKey: true, autoIncrement: true },
        name: { type: DataTypes.STRING(80), field: 'display_name' },
        email: { type: DataTypes.STRING(254), unique: true },
        emailVerified: { type: DataTypes.DATE, field: 'email_verified_at' },
        image: { type: DataTypes.VIRTUAL, get: () => null },
      },
      { ...opts, tableName: 'users' },
    );
  const Account =
    models.auth_account ??
    sequelize.define(
      'auth_account',
      { ...adapterModels.Account, userId: { type: DataTypes.INTEGER.UNSIGNED } },
      { ...opts, tableName: 'accounts' },
    );
  const Session =
    models.auth_session ??
    sequelize.define(
      'auth_session',
      { ...adapterModels.Session, userId: { type: DataTypes.INTEGER.UNSIGNED } },
      { ...opts, tableName: 'sessions' },
    );
  const VerificationToken =
    models.auth_verification_token ??
    sequelize.define('auth_verification_token', adapterModels.VerificationToken, {
      ...opts,
      tableName: 'verification_tokens',
    });
  const adapter = SequelizeAdapter(sequelize, {
    synchronize: false,
    models: { User, Account, Session, VerificationToken } as never,
  });
  return {
    ...adapter,
    // Accounts are made by sign-up (which sets a handle); a link never creates one.
    async createUser() {
      throw new Error('Sign up first: a sign-in link only works for an existing account.');
    },
  };
}
