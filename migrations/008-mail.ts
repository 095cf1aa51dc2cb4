import { DataTypes, QueryTypes, type QueryInterface } from 'sequelize';

/**
 * E-mail: each member's digest and notification switches, the tags they follow, and
 * the outbox every message is written to in the same transaction as its event.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  const opts = { charset: 'utf8mb4', collate: 'utf8mb4_unicode_ci' };
  const flag = { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true };
  await qi.addColumn('users', 'digest_frequency', {
    type: DataTypes.ENUM('off', 'daily', 'weekly'),
    allowNull: false,
    defaultValue: 'off',
  });
  await qi.addColumn('users', 'notify_answers', flag);
  await qi.addColumn('users', 'notify_replies', flag);
  await qi.addColumn('users', 'notify_fixed', flag);
  await qi.addColumn('users', 'notify_moderation', flag);
  await qi.addColumn('users', 'notify_expert', flag);
  await qi.addIndex('users', ['digest_frequency', 'id'], { name: 'users_digest' });

  await qi.createTable(
    'tag_follows',
    {
      user_id: {
        type: DataTypes.INTEGER.UNSIGNED,
        primaryKey: true,
        references: { model: 'users', key: 'id' },
        onDelete: 'CASCADE',
      },
      tag_id: {
        type: DataTypes.INTEGER.UNSIGNED,
        primaryKey: true,
        references: { model: 'tags', key: 'id' },
        onDelete: 'CASCADE',
      },
      created_at: { type: DataTypes.DATE, allowNull: false },
    },
    opts,
  );
  await qi.addIndex('tag_follows', ['tag_id', 'user_id'], { name: 'tag_follows_tag' });

  await qi.createTable(
    'mail_outbox',
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true, allowNull: false },
      // one message per recipient per event: "answer:12:to:7", "digest:weekly:2026-W49:to:7"
      dedupe_key: { type: DataTypes.STRING(160), allowNull: false, unique: true },
      user_id: {
        type: DataTypes.INTEGER.UNSIGNED,
        allowNull: true,
        references: { model: 'users', key: 'id' },
        onDelete: 'SET NULL',
      },
      to_address: { type: DataTypes.STRING(254), allowNull: false },
      kind: { type: DataTypes.STRING(40), allowNull: false },
      subject: { type: DataTypes.STRING(300), allowNull: false },
      text_body: { type: DataTypes.TEXT('medium'), allowNull: false },
      html_body: { type: DataTypes.TEXT('medium'), allowNull: true },
      headers: { type: DataTypes.JSON, allowNull: true },
      status: {
        type: DataTypes.ENUM('pending', 'sending', 'sent', 'failed'),
        allowNull: false,
        defaultValue: 'pending',
      },
      attempts: { type: DataTypes.TINYINT.UNSIGNED, allowNull: false, defaultValue: 0 },
      next_attempt_at: { type: DataTypes.DATE, allowNull: false },
      // a worker's claim: another worker may take the message over once this has passed
      locked_until: { type: DataTypes.DATE, allowNull: true },
      last_error: { type: DataTypes.TEXT, allowNull: true },
      sent_at: { type: DataTypes.DATE, allowNull: true },
      created_at: { type: DataTypes.DATE, allowNull: false },
      updated_at: { type: DataTypes.DATE, allowNull: false },
    },
    opts,
  );
  await qi.addIndex('mail_outbox', ['status', 'next_attempt_at'], { name: 'mail_outbox_due' });
  await qi.addIndex('mail_outbox', ['created_at', 'id'], { name: 'mail_outbox_newest' });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('mail_outbox');
  await qi.dropTable('tag_follows');
  const present = Object.keys(await qi.describeTable('users'));
  const cols = [
    'digest_frequency',
    'notify_answers',
    'notify_replies',
    'notify_fixed',
    'notify_moderation',
    'notify_expert',
  ].filter((c) => present.includes(c));
  // Plain ALTER TABLE, as in 003: removeColumn trips over the driver's frozen result metadata.
  if (cols.length)
    await qi.sequelize.query(
      `ALTER TABLE users DROP INDEX users_digest, ${cols.map((c) => `DROP COLUMN ${c}`).join(', ')}`,
      { type: QueryTypes.UPDATE },
    );
}
