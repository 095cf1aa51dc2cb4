import { DataTypes, QueryTypes, type QueryInterface } from 'sequelize';

/**
 * The public question lists at forum scale (issue 23).
 *
 * Counts: every list page shows how many questions it holds, and COUNT(*) over the
 * visible questions read ~100,000 index entries per page view. `question_list_counts`
 * keeps one row per public list ('all', 'unanswered', 'tag:<id>'), kept by triggers in
 * the same transaction as each write, whatever code makes it (asking, answering,
 * retagging, a moderator's hide, delete or restore, the seeds): a write path added later
 * cannot forget them.
 *
 * Tag lists: a tag holds thousands of questions, and ordering them newest first meant
 * fetching every id in the tag and sorting them. `question_tags` now carries its
 * question's creation time and whether it is listed (neither hidden nor deleted), kept by
 * the same triggers, so a tag's page reads its index in order from any point.
 */
const COUNT = `INSERT INTO question_list_counts (list, questions) VALUES`;
const UPSERT = `ON DUPLICATE KEY UPDATE questions = questions + VALUES(questions)`;
const LISTED = (row: 'NEW' | 'OLD') => `(${row}.hidden_at IS NULL AND ${row}.deleted_at IS NULL)`;

const TRIGGERS: [name: string, sql: string][] = [
  [
    'question_tags_fill',
    `BEFORE INSERT ON question_tags FOR EACH ROW
     SET NEW.question_created_at = (SELECT created_at FROM questions WHERE id = NEW.question_id),
         NEW.question_listed = COALESCE((SELECT hidden_at IS NULL AND deleted_at IS NULL FROM questions WHERE id = NEW.question_id), 0)`,
  ],
  [
    'question_tags_count_insert',
    `AFTER INSERT ON question_tags FOR EACH ROW
     IF NEW.question_listed THEN ${COUNT} (CONCAT('tag:', NEW.tag_id), 1) ${UPSERT}; END IF`,
  ],
  [
    'question_tags_count_delete',
    `AFTER DELETE ON question_tags FOR EACH ROW
     IF OLD.question_listed THEN ${COUNT} (CONCAT('tag:', OLD.tag_id), -1) ${UPSERT}; END IF`,
  ],
  [
    'questions_count_insert',
    `AFTER INSERT ON questions FOR EACH ROW
     IF ${LISTED('NEW')} THEN
       ${COUNT} ('all', 1) ${UPSERT};
       IF NEW.answer_count = 0 THEN ${COUNT} ('unanswered', 1) ${UPSERT}; END IF;
     END IF`,
  ],
  [
    'questions_count_update',
    `AFTER UPDATE ON questions FOR EACH ROW
     BEGIN
       DECLARE was, now_listed, was_waiting, now_waiting TINYINT;
       SET was = ${LISTED('OLD')}, now_listed = ${LISTED('NEW')};
       SET was_waiting = was AND OLD.answer_count = 0, now_waiting = now_listed AND NEW.answer_count = 0;
       IF was <> now_listed THEN
         ${COUNT} ('all', now_listed - was) ${UPSERT};
         INSERT INTO question_list_counts (list, questions)
           SELECT CONCAT('tag:', tag_id), now_listed - was FROM question_tags WHERE question_id = NEW.id ${UPSERT};
       END IF;
       IF was_waiting <> now_waiting THEN ${COUNT} ('unanswered', now_waiting - was_waiting) ${UPSERT}; END IF;
       IF was <> now_listed OR NOT (NEW.created_at <=> OLD.created_at) THEN
         UPDATE question_tags SET question_listed = now_listed, question_created_at = NEW.created_at
           WHERE question_id = NEW.id;
       END IF;
     END`,
  ],
  [
    // BEFORE: the question's tag rows go with it by cascade, which fires no trigger
    'questions_count_delete',
    `BEFORE DELETE ON questions FOR EACH ROW
     IF ${LISTED('OLD')} THEN
       ${COUNT} ('all', -1) ${UPSERT};
       IF OLD.answer_count = 0 THEN ${COUNT} ('unanswered', -1) ${UPSERT}; END IF;
       INSERT INTO question_list_counts (list, questions)
         SELECT CONCAT('tag:', tag_id), -1 FROM question_tags WHERE question_id = OLD.id ${UPSERT};
     END IF`,
  ],
  [
    'tags_count_delete',
    `AFTER DELETE ON tags FOR EACH ROW DELETE FROM question_list_counts WHERE list = CONCAT('tag:', OLD.id)`,
  ],
];

export async function up({ context: qi }: { context: QueryInterface }) {
  // not RAW: a RAW query trips over the mariadb driver's frozen result metadata (as in 003)
  const sql = (q: string) => qi.sequelize.query(q, { type: QueryTypes.UPDATE });
  await qi.createTable(
    'question_list_counts',
    {
      list: { type: DataTypes.STRING(40), primaryKey: true, allowNull: false },
      // signed: a miscount shows as a wrong number, never as an out-of-range error that refuses a write
      questions: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    },
    { charset: 'utf8mb4', collate: 'utf8mb4_unicode_ci' },
  );
  await qi.addColumn('question_tags', 'question_created_at', { type: DataTypes.DATE, allowNull: true });
  await qi.addColumn('question_tags', 'question_listed', {
    type: DataTypes.BOOLEAN,
    allowNull: false,
    defaultValue: false,
  });
  await sql(`UPDATE question_tags qt JOIN questions q ON q.id = qt.question_id
             SET qt.question_created_at = q.created_at, qt.question_listed = (q.hidden_at IS NULL AND q.deleted_at IS NULL)`);
  await sql(`INSERT INTO question_list_counts (list, questions)
             SELECT 'all', COUNT(*) FROM questions WHERE hidden_at IS NULL AND deleted_at IS NULL
             UNION ALL SELECT 'unanswered', COUNT(*) FROM questions WHERE hidden_at IS NULL AND deleted_at IS NULL AND answer_count = 0
             UNION ALL SELECT CONCAT('tag:', tag_id), COUNT(*) FROM question_tags WHERE question_listed GROUP BY tag_id`);
  for (const [name, body] of TRIGGERS) await sql(`CREATE TRIGGER ${name} ${body}`);
  // a tag's questions newest first, from any point, read in index order (the primary key follows)
  await qi.addIndex('question_tags', ['tag_id', 'question_listed', 'question_created_at', 'question_id'], {
    name: 'question_tags_tag_listed',
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  const sql = (q: string) => qi.sequelize.query(q, { type: QueryTypes.UPDATE });
  for (const [name] of [...TRIGGERS].reverse()) await sql(`DROP TRIGGER IF EXISTS ${name}`);
  await sql(`ALTER TABLE question_tags DROP INDEX IF EXISTS question_tags_tag_listed,
             DROP COLUMN IF EXISTS question_listed, DROP COLUMN IF EXISTS question_created_at`);
  await sql('DROP TABLE IF EXISTS question_list_counts');
}
