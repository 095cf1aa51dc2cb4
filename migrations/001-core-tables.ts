import { DataTypes, type QueryInterface } from 'sequelize';

/** First form of the forum: members, tags, questions and answers. */
export async function up({ context: qi }: { context: QueryInterface }) {
  const id = { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true, allowNull: false };
  const stamps = {
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  };
  const opts = { charset: 'utf8mb4', collate: 'utf8mb4_unicode_ci' };

  await qi.createTable(
    'users',
    {
      id,
      handle: { type: DataTypes.STRING(40), allowNull: false, unique: true },
      display_name: { type: DataTypes.STRING(80), allowNull: false },
      email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
      role: {
        type: DataTypes.ENUM('member', 'expert', 'moderator', 'admin'),
        allowNull: false,
        defaultValue: 'member',
      },
      region: { type: DataTypes.STRING(80), allowNull: true },
      bio: { type: DataTypes.TEXT, allowNull: true },
      ...stamps,
    },
    opts,
  );

  await qi.createTable(
    'tags',
    {
      id,
      slug: { type: DataTypes.STRING(40), allowNull: false, unique: true },
      name: { type: DataTypes.STRING(60), allowNull: false },
      description: { type: DataTypes.TEXT, allowNull: true },
      ...stamps,
    },
    opts,
  );

  await qi.createTable(
    'questions',
    {
      id,
      author_id: {
        type: DataTypes.INTEGER.UNSIGNED,
        allowNull: false,
        references: { model: 'users', key: 'id' },
        onDelete: 'RESTRICT',
      },
      title: { type: DataTypes.STRING(160), allowNull: false },
      body: { type: DataTypes.TEXT('medium'), allowNull: false },
      answer_count: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 },
      fixed_answer_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
      ...stamps,
    },
    opts,
  );
  // The newest-first list pages on this index.
  await qi.addIndex('questions', ['created_at', 'id'], { name: 'questions_created_at_id' });

  await qi.createTable(
    'answers',
    {
      id,
      question_id: {
        type: DataTypes.INTEGER.UNSIGNED,
        allowNull: false,
        references: { model: 'questions', key: 'id' },
        onDelete: 'CASCADE',
      },
      author_id: {
        type: DataTypes.INTEGER.UNSIGNED,
        allowNull: false,
        references: { model: 'users', key: 'id' },
        onDelete: 'RESTRICT',
      },
      body: { type: DataTypes.TEXT('medium'), allowNull: false },
      ...stamps,
    },
    opts,
  );
  await qi.addIndex('answers', ['question_id', 'created_at'], { name: 'answers_question_created' });

  await qi.createTable(
    'question_tags',
    {
      question_id: {
        type: DataTypes.INTEGER.UNSIGNED,
        primaryKey: true,
        references: { model: 'questions', key: 'id' },
        onDelete: 'CASCADE',
      },
      tag_id: {
        type: DataTypes.INTEGER.UNSIGNED,
        primaryKey: true,
        references: { model: 'tags', key: 'id' },
        onDelete: 'CASCADE',
      },
    },
    opts,
  );
  await qi.addIndex('question_tags', ['tag_id', 'question_id'], { name: 'question_tags_tag' });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('question_tags');
  await qi.dropTable('answers');
  await qi.dropTable('questions');
  await qi.dropTable('tags');
  await qi.dropTable('users');
}
