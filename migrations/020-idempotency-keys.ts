import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * Idempotency keys: a phone that sends a record, loses its signal before the answer and
 * sends it again must not make two. The client names each record with a key of its own;
 * the first request that carries it writes the record and its answer here in the same
 * transaction, and a repeat gets that answer back.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable(
    'idempotency_keys',
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true, allowNull: false },
      user_id: {
        type: DataTypes.INTEGER.UNSIGNED,
        allowNull: false,
        references: { model: 'users', key: 'id' },
        onDelete: 'CASCADE',
      },
      // what was sent: 'field-log.create', 'site.version', …
      scope: { type: DataTypes.STRING(40), allowNull: false },
      idem_key: { type: DataTypes.STRING(64), allowNull: false },
      // sha256 of the request body, so one key cannot stand for two different records
      fingerprint: { type: DataTypes.CHAR(64), allowNull: false },
      status: { type: DataTypes.SMALLINT.UNSIGNED, allowNull: false },
      response: { type: DataTypes.JSON, allowNull: false },
      created_at: { type: DataTypes.DATE, allowNull: false },
    },
    { charset: 'utf8mb4', collate: 'utf8mb4_unicode_ci' },
  );
  await qi.addIndex('idempotency_keys', ['user_id', 'scope', 'idem_key'], {
    name: 'idempotency_keys_once',
    unique: true,
  });
  await qi.addIndex('idempotency_keys', ['created_at'], { name: 'idempotency_keys_age' });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('idempotency_keys');
}
