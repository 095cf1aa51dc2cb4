import { DataTypes, QueryTypes, type QueryInterface } from 'sequelize';

/** Sign-in: password hashes, verified e-mail, single-use tokens, expert applications and in-app notices. */
export async function up({ context: qi }: { context: QueryInterface }) {
  const opts = { charset: 'utf8mb4', collate: 'utf8mb4_unicode_ci' };
  const userRef = (allowNull: boolean, onDelete: 'CASCADE' | 'SET NULL' | 'RESTRICT' = 'CASCADE') => ({
    type: DataTypes.INTEGER.UNSIGNED,
    allowNull,
    references: { model: 'users', key: 'id' },
    onDelete,
  });
  await qi.addColumn('users', 'password_hash', { type: DataTypes.STRING(255), allowNull: true });
  await qi.addColumn('users', 'email_verified_at', { type: DataTypes.DATE, allowNull: true });
  await qi.addColumn('users', 'units', { type: DataTypes.ENUM('US', 'metric'), allowNull: false, defaultValue: 'US' });

  await qi.createTable(
    'auth_tokens',
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true, allowNull: false },
      user_id: userRef(false),
      purpose: { type: DataTypes.ENUM('verify-email', 'reset-password', 'sign-in-link'), allowNull: false },
      // sha256 of the token; the token itself only ever travels in the e-mail
      token_hash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
      expires_at: { type: DataTypes.DATE, allowNull: false },
      used_at: { type: DataTypes.DATE, allowNull: true },
      created_at: { type: DataTypes.DATE, allowNull: false },
    },
    opts,
  );
  await qi.addIndex('auth_tokens', ['user_id', 'purpose'], { name: 'auth_tokens_user_purpose' });

  await qi.createTable(
    'expert_applications',
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true, allowNull: false },
      user_id: userRef(false),
      pumps_built: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      years: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      region: { type: DataTypes.STRING(80), allowNull: false },
      experience: { type: DataTypes.TEXT, allowNull: false },
      links: { type: DataTypes.JSON, allowNull: false },
      status: { type: DataTypes.ENUM('pending', 'approved', 'declined'), allowNull: false, defaultValue: 'pending' },
      decided_by: userRef(true, 'SET NULL'),
      decision_note: { type: DataTypes.TEXT, allowNull: true },
      decided_at: { type: DataTypes.DATE, allowNull: true },
      created_at: { type: DataTypes.DATE, allowNull: false },
      updated_at: { type: DataTypes.DATE, allowNull: false },
    },
    opts,
  );
  await qi.addIndex('expert_applications', ['status', 'created_at'], { name: 'expert_applications_status' });

  await qi.createTable(
    'notices',
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true, allowNull: false },
      user_id: userRef(false),
      kind: { type: DataTypes.STRING(40), allowNull: false },
      message: { type: DataTypes.TEXT, allowNull: false },
      link: { type: DataTypes.STRING(300), allowNull: true },
      read_at: { type: DataTypes.DATE, allowNull: true },
      created_at: { type: DataTypes.DATE, allowNull: false },
    },
    opts,
  );
  await qi.addIndex('notices', ['user_id', 'created_at'], { name: 'notices_user_created' });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('notices');
  await qi.dropTable('expert_applications');
  await qi.dropTable('auth_tokens');
  // Plain ALTER TABLE: queryInterface.removeColumn runs a RAW query that trips over the
  // mariadb driver's frozen result metadata.
  const present = Object.keys(await qi.describeTable('users'));
  const drop = ['units', 'email_verified_at', 'password_hash'].filter((c) => present.includes(c));
  if (drop.length) {
    await qi.sequelize.query(`ALTER TABLE users ${drop.map((c) => `DROP COLUMN ${c}`).join(', ')}`, {
      type: QueryTypes.UPDATE,
    });
  }
}
