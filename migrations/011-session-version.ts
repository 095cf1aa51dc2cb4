import { DataTypes, QueryTypes, type QueryInterface } from 'sequelize';

/**
 * A counter carried in every session token: a password reset, "sign out everywhere",
 * a suspension or a role change bumps it, and tokens issued before then stop working.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.addColumn('users', 'session_version', {
    type: DataTypes.INTEGER.UNSIGNED,
    allowNull: false,
    defaultValue: 0,
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  // Plain ALTER TABLE: queryInterface.removeColumn runs a RAW query that trips over the
  // mariadb driver's frozen result metadata.
  if ('session_version' in (await qi.describeTable('users'))) {
    await qi.sequelize.query('ALTER TABLE users DROP COLUMN session_version', { type: QueryTypes.UPDATE });
  }
}
