import type { QueryInterface } from 'sequelize';

/**
 * Indexes for the question lists as they are actually queried: every list leaves out
 * hidden and deleted questions, so the visibility columns lead (or follow the
 * filter column) and newest-first paging reads the index in order, counts included.
 * Found by the EXPLAIN test in tests/reliability/indexes.test.ts.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.addIndex('questions', ['deleted_at', 'hidden_at', 'created_at', 'id'], { name: 'questions_visible_newest' });
  await qi.addIndex('questions', ['answer_count', 'deleted_at', 'hidden_at', 'created_at'], {
    name: 'questions_unanswered_visible',
  });
  await qi.addIndex('questions', ['author_id', 'deleted_at', 'hidden_at', 'created_at'], {
    name: 'questions_author_visible',
  });
  await qi.removeIndex('questions', 'questions_unanswered');
  await qi.removeIndex('questions', 'questions_author');
  // the members list pages by handle: a covering index reads a page in order
  await qi.addIndex('users', ['handle', 'display_name', 'role'], { name: 'users_handle_list' });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.removeIndex('users', 'users_handle_list');
  await qi.addIndex('questions', ['answer_count', 'created_at'], { name: 'questions_unanswered' });
  await qi.addIndex('questions', ['author_id', 'created_at'], { name: 'questions_author' });
  await qi.removeIndex('questions', 'questions_author_visible');
  await qi.removeIndex('questions', 'questions_unanswered_visible');
  await qi.removeIndex('questions', 'questions_visible_newest');
}
