import { DataTypes, QueryTypes, type QueryInterface } from 'sequelize';

/**
 * The forum proper: site sheets on questions, worked calculations on answers,
 * threaded replies, revisions, helpful marks, follows and photos.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  const opts = { charset: 'utf8mb4', collate: 'utf8mb4_unicode_ci' };
  const id = () => ({ type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true, allowNull: false });
  const ref = (model: string, allowNull = false, onDelete: 'CASCADE' | 'SET NULL' | 'RESTRICT' = 'CASCADE') => ({
    type: DataTypes.INTEGER.UNSIGNED,
    allowNull,
    references: { model, key: 'id' },
    onDelete,
  });
  const POST = DataTypes.ENUM('question', 'answer', 'reply');

  await qi.addColumn('questions', 'site_sheet', { type: DataTypes.JSON, allowNull: true });
  await qi.addColumn('questions', 'helpful_count', {
    type: DataTypes.INTEGER.UNSIGNED,
    allowNull: false,
    defaultValue: 0,
  });
  await qi.addColumn('questions', 'guide_slug', { type: DataTypes.STRING(80), allowNull: true });
  await qi.addColumn('questions', 'last_activity_at', { type: DataTypes.DATE, allowNull: true });
  await qi.addIndex('questions', ['answer_count', 'created_at'], { name: 'questions_unanswered' });
  await qi.addIndex('questions', ['author_id', 'created_at'], { name: 'questions_author' });

  await qi.addColumn('answers', 'helpful_count', {
    type: DataTypes.INTEGER.UNSIGNED,
    allowNull: false,
    defaultValue: 0,
  });
  await qi.addColumn('answers', 'calculation_id', { ...ref('worked_calculations', true, 'SET NULL') });

  await qi.createTable(
    'replies',
    {
      id: id(),
      question_id: ref('questions'),
      parent_type: { type: DataTypes.ENUM('question', 'answer'), allowNull: false },
      // the answer replied under, when parent_type is 'answer'
      answer_id: ref('answers', true),
      // the reply this one answers, for nesting; depth is capped and deeper ones flatten
      reply_to_id: ref('replies', true, 'SET NULL'),
      depth: { type: DataTypes.TINYINT.UNSIGNED, allowNull: false, defaultValue: 0 },
      author_id: ref('users', false, 'RESTRICT'),
      body: { type: DataTypes.TEXT, allowNull: false },
      helpful_count: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 },
      created_at: { type: DataTypes.DATE, allowNull: false },
      updated_at: { type: DataTypes.DATE, allowNull: false },
    },
    opts,
  );
  await qi.addIndex('replies', ['question_id', 'created_at'], { name: 'replies_thread' });

  await qi.createTable(
    'revisions',
    {
      id: id(),
      post_type: { type: POST, allowNull: false },
      post_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      editor_id: ref('users', false, 'RESTRICT'),
      title: { type: DataTypes.STRING(160), allowNull: true },
      body: { type: DataTypes.TEXT('medium'), allowNull: false },
      created_at: { type: DataTypes.DATE, allowNull: false },
    },
    opts,
  );
  await qi.addIndex('revisions', ['post_type', 'post_id', 'created_at'], { name: 'revisions_post' });

  await qi.createTable(
    'helpful_marks',
    {
      post_type: { type: POST, primaryKey: true, allowNull: false },
      post_id: { type: DataTypes.INTEGER.UNSIGNED, primaryKey: true },
      user_id: { ...ref('users'), primaryKey: true },
      created_at: { type: DataTypes.DATE, allowNull: false },
    },
    opts,
  );

  await qi.createTable(
    'question_follows',
    {
      question_id: { ...ref('questions'), primaryKey: true },
      user_id: { ...ref('users'), primaryKey: true },
      created_at: { type: DataTypes.DATE, allowNull: false },
    },
    opts,
  );
  await qi.addIndex('question_follows', ['user_id', 'created_at'], { name: 'question_follows_user' });

  await qi.createTable(
    'photos',
    {
      id: id(),
      public_id: { type: DataTypes.STRING(24), allowNull: false, unique: true },
      owner_id: ref('users', false, 'RESTRICT'),
      question_id: ref('questions', true, 'SET NULL'),
      answer_id: ref('answers', true, 'SET NULL'),
      mime: { type: DataTypes.STRING(40), allowNull: false },
      width: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      height: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      bytes: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      alt: { type: DataTypes.STRING(200), allowNull: true },
      created_at: { type: DataTypes.DATE, allowNull: false },
    },
    opts,
  );
  await qi.addIndex('photos', ['question_id'], { name: 'photos_question' });
  await qi.addIndex('photos', ['answer_id'], { name: 'photos_answer' });

  await qi.sequelize.query('UPDATE questions SET last_activity_at = created_at', { type: QueryTypes.UPDATE });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  for (const t of ['photos', 'question_follows', 'helpful_marks', 'revisions', 'replies']) await qi.dropTable(t);
  const drop = async (table: string, cols: string[], fks: string[] = []) => {
    const present = Object.keys(await qi.describeTable(table));
    for (const fk of fks) {
      const rows = await qi.sequelize.query<{ name: string }>(
        `SELECT CONSTRAINT_NAME AS name FROM information_schema.KEY_COLUMN_USAGE WHERE TABLE_SCHEMA = DATABASE() AND TABLE_NAME = '${table}' AND COLUMN_NAME = '${fk}' AND REFERENCED_TABLE_NAME IS NOT NULL`,
        { type: QueryTypes.SELECT },
      );
      for (const r of rows)
        await qi.sequelize.query(`ALTER TABLE ${table} DROP FOREIGN KEY \`${r.name}\``, { type: QueryTypes.UPDATE });
    }
    const gone = cols.filter((c) => present.includes(c));
    if (gone.length)
      await qi.sequelize.query(`ALTER TABLE ${table} ${gone.map((c) => `DROP COLUMN ${c}`).join(', ')}`, {
        type: QueryTypes.UPDATE,
      });
  };
  await qi.removeIndex('questions', 'questions_unanswered').catch(() => undefined);
  await qi.removeIndex('questions', 'questions_author').catch(() => undefined);
  await drop('answers', ['helpful_count', 'calculation_id'], ['calculation_id']);
  await drop('questions', ['site_sheet', 'helpful_count', 'guide_slug', 'last_activity_at']);
}
