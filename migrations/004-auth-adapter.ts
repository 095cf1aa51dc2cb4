import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * The tables next-auth's Sequelize adapter reads and writes, in the adapter's own
 * shape (underscored). Its user is our `users` table (lib/auth/adapter.ts maps the
 * columns); sessions are JWTs, so `sessions` stays empty unless the strategy changes.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  const opts = { charset: 'utf8mb4', collate: 'utf8mb4_unicode_ci' };
  const userId = {
    type: DataTypes.INTEGER.UNSIGNED,
    allowNull: true,
    references: { model: 'users', key: 'id' },
    onDelete: 'CASCADE',
  };
  await qi.createTable(
    'verification_tokens',
    {
      // next-auth stores a hash of the e-mailed token, never the token itself
      token: { type: DataTypes.STRING(255), primaryKey: true, allowNull: false },
      identifier: { type: DataTypes.STRING(254), allowNull: false },
      expires: { type: DataTypes.DATE, allowNull: false },
    },
    opts,
  );
  await qi.addIndex('verification_tokens', ['identifier'], { name: 'verification_tokens_identifier' });
  await qi.createTable(
    'accounts',
    {
      id: { type: DataTypes.UUID, primaryKey: true, allowNull: false },
      type: { type: DataTypes.STRING(40), allowNull: false },
      provider: { type: DataTypes.STRING(80), allowNull: false },
      provider_account_id: { type: DataTypes.STRING(255), allowNull: false },
      refresh_token: { type: DataTypes.STRING(2048), allowNull: true },
      access_token: { type: DataTypes.STRING(2048), allowNull: true },
      expires_at: { type: DataTypes.INTEGER, allowNull: true },
      token_type: { type: DataTypes.STRING(40), allowNull: true },
      scope: { type: DataTypes.STRING(255), allowNull: true },
      id_token: { type: DataTypes.TEXT, allowNull: true },
      session_state: { type: DataTypes.STRING(255), allowNull: true },
      user_id: userId,
    },
    opts,
  );
  await qi.addIndex('accounts', ['provider', 'provider_account_id'], { name: 'accounts_provider', unique: true });
  await qi.createTable(
    'sessions',
    {
      id: { type: DataTypes.UUID, primaryKey: true, allowNull: false },
      expires: { type: DataTypes.DATE, allowNull: false },
      session_token: { type: DataTypes.STRING(255), allowNull: false, unique: true },
      user_id: userId,
    },
    opts,
  );
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('sessions');
  await qi.dropTable('accounts');
  await qi.dropTable('verification_tokens');
}
