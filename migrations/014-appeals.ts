import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * Appeals: an author asks the moderators to look again at a decision on their post.
 * Each is an item of its own in the review queue until a moderator acts on the post.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  const ref = (model: string, allowNull = false) => ({
    type: DataTypes.INTEGER.UNSIGNED,
    allowNull,
    references: { model, key: 'id' },
    onDelete: allowNull ? 'SET NULL' : 'CASCADE',
  });
  await qi.createTable(
    'appeals',
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true, allowNull: false },
      user_id: ref('users'),
      post_type: { type: DataTypes.ENUM('question', 'answer', 'reply', 'photo', 'field-log'), allowNull: false },
      post_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      text: { type: DataTypes.STRING(1000), allowNull: false },
      status: { type: DataTypes.ENUM('open', 'decided'), allowNull: false, defaultValue: 'open' },
      resolved_by: ref('users', true),
      resolved_at: { type: DataTypes.DATE, allowNull: true },
      created_at: { type: DataTypes.DATE, allowNull: false },
    },
    { charset: 'utf8mb4', collate: 'utf8mb4_unicode_ci' },
  );
  await qi.addIndex('appeals', ['status', 'created_at'], { name: 'appeals_queue' });
  await qi.addIndex('appeals', ['post_type', 'post_id', 'status'], { name: 'appeals_post' });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('appeals');
}
