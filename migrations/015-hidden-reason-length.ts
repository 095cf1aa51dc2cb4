import { QueryTypes, type QueryInterface } from 'sequelize';

/**
 * A hidden post keeps the moderator's reason whole: the review queue accepts a reason of
 * up to 1,000 characters (lib/validation/moderation.ts) and the audit log keeps as much,
 * but the posts' hidden_reason held 300, so a longer reason failed the action with a 500.
 */
const TABLES = ['questions', 'answers', 'replies', 'photos', 'field_log_entries'];

// Plain ALTER TABLE, as in 012: the query interface's RAW queries trip over the mariadb driver's frozen metadata.
const modify = (qi: QueryInterface, table: string, length: number) =>
  qi.sequelize.query(`ALTER TABLE ${table} MODIFY COLUMN hidden_reason VARCHAR(${length}) NULL`, {
    type: QueryTypes.UPDATE,
  });

export async function up({ context: qi }: { context: QueryInterface }) {
  for (const table of TABLES) await modify(qi, table, 1000);
}

export async function down({ context: qi }: { context: QueryInterface }) {
  for (const table of TABLES) {
    // a strict server refuses to narrow a column over longer values: keep their first 300 characters
    await qi.sequelize.query(
      `UPDATE ${table} SET hidden_reason = LEFT(hidden_reason, 300) WHERE CHAR_LENGTH(hidden_reason) > 300`,
      { type: QueryTypes.UPDATE },
    );
    await modify(qi, table, 300);
  }
}
