import { DataTypes, QueryTypes, type QueryInterface } from 'sequelize';

/**
 * Moderation: flags, hidden/deleted/locked state on posts, suspensions, and an
 * audit log that the database itself refuses to change (triggers).
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  const opts = { charset: 'utf8mb4', collate: 'utf8mb4_unicode_ci' };
  const ref = (model: string, allowNull = false) => ({
    type: DataTypes.INTEGER.UNSIGNED,
    allowNull,
    references: { model, key: 'id' },
    onDelete: allowNull ? 'SET NULL' : 'RESTRICT',
  });
  for (const table of ['questions', 'answers', 'replies', 'photos']) {
    await qi.addColumn(table, 'hidden_at', { type: DataTypes.DATE, allowNull: true });
    await qi.addColumn(table, 'hidden_reason', { type: DataTypes.STRING(300), allowNull: true });
    await qi.addColumn(table, 'deleted_at', { type: DataTypes.DATE, allowNull: true });
  }
  await qi.addColumn('questions', 'locked_at', { type: DataTypes.DATE, allowNull: true });
  await qi.addColumn('users', 'suspended_until', { type: DataTypes.DATE, allowNull: true });

  await qi.createTable(
    'flags',
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true, allowNull: false },
      post_type: { type: DataTypes.ENUM('question', 'answer', 'reply', 'photo', 'field-log'), allowNull: false },
      post_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      flagger_id: ref('users'),
      reason: { type: DataTypes.ENUM('spam', 'unsafe', 'rude', 'off-topic', 'other'), allowNull: false },
      note: { type: DataTypes.STRING(1000), allowNull: true },
      status: { type: DataTypes.ENUM('open', 'dismissed', 'upheld'), allowNull: false, defaultValue: 'open' },
      resolved_by: ref('users', true),
      resolved_at: { type: DataTypes.DATE, allowNull: true },
      created_at: { type: DataTypes.DATE, allowNull: false },
    },
    opts,
  );
  await qi.addIndex('flags', ['status', 'created_at'], { name: 'flags_queue' });
  await qi.addIndex('flags', ['post_type', 'post_id', 'status'], { name: 'flags_post' });

  await qi.createTable(
    'audit_log',
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true, allowNull: false },
      actor_id: ref('users', true),
      action: { type: DataTypes.STRING(40), allowNull: false },
      target_type: { type: DataTypes.STRING(20), allowNull: false },
      target_id: { type: DataTypes.STRING(40), allowNull: false },
      reason: { type: DataTypes.STRING(1000), allowNull: false },
      details: { type: DataTypes.JSON, allowNull: true },
      created_at: { type: DataTypes.DATE, allowNull: false },
    },
    opts,
  );
  await qi.addIndex('audit_log', ['created_at'], { name: 'audit_log_created' });
  await qi.addIndex('audit_log', ['action', 'created_at'], { name: 'audit_log_action' });
  await qi.addIndex('audit_log', ['actor_id', 'created_at'], { name: 'audit_log_actor' });
  // Entries cannot be edited or removed, whoever asks.
  for (const [name, when] of [
    ['audit_log_no_update', 'UPDATE'],
    ['audit_log_no_delete', 'DELETE'],
  ]) {
    await qi.sequelize
      .query(
        `CREATE TRIGGER ${name} BEFORE ${when} ON audit_log FOR EACH ROW SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'audit log entries cannot be changed'`,
        { type: QueryTypes.RAW, raw: true },
      )
      .catch(async (err: Error) => {
        // the RAW-result quirk of the mariadb driver: the trigger exists if this reads it back
        const rows = await qi.sequelize.query(
          `SELECT TRIGGER_NAME FROM information_schema.TRIGGERS WHERE TRIGGER_SCHEMA = DATABASE() AND TRIGGER_NAME = '${name}'`,
          { type: QueryTypes.SELECT },
        );
        if (rows.length === 0) throw err;
      });
  }
}

export async function down({ context: qi }: { context: QueryInterface }) {
  for (const name of ['audit_log_no_update', 'audit_log_no_delete']) {
    await qi.sequelize.query(`DROP TRIGGER IF EXISTS ${name}`, { type: QueryTypes.UPDATE });
  }
  await qi.dropTable('audit_log');
  await qi.dropTable('flags');
  const drop = async (table: string, cols: string[]) => {
    const present = Object.keys(await qi.describeTable(table));
    const gone = cols.filter((c) => present.includes(c));
    if (gone.length)
      await qi.sequelize.query(`ALTER TABLE ${table} ${gone.map((c) => `DROP COLUMN ${c}`).join(', ')}`, {
        type: QueryTypes.UPDATE,
      });
  };
  await drop('users', ['suspended_until']);
  await drop('questions', ['locked_at', 'hidden_at', 'hidden_reason', 'deleted_at']);
  for (const t of ['answers', 'replies', 'photos']) await drop(t, ['hidden_at', 'hidden_reason', 'deleted_at']);
}
