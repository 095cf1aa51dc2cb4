import { DataTypes, type QueryInterface } from 'sequelize';

/** Counts for the flood and sign-in limits, shared by every app instance (RATE_LIMIT_STORE=mariadb). */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable(
    'rate_limits',
    {
      key: { type: DataTypes.STRING(255), primaryKey: true, allowNull: false },
      points: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
      expire: { type: DataTypes.BIGINT.UNSIGNED, allowNull: true },
    },
    { charset: 'utf8mb4', collate: 'utf8mb4_bin' },
  );
  await qi.addIndex('rate_limits', ['expire'], { name: 'rate_limits_expire' });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('rate_limits');
}
