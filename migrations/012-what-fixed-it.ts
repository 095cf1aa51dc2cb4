import { DataTypes, QueryTypes, type QueryInterface } from 'sequelize';

/**
 * The asker's one line saying what fixed it, saved with the choice of the answer.
 * Null while nothing is chosen; questions marked before this line existed keep null
 * and their thread shows the chosen answer without a line.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.addColumn('questions', 'what_fixed_it', { type: DataTypes.STRING(140), allowNull: true });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  // Plain ALTER TABLE: queryInterface.removeColumn runs a RAW query that trips over the
  // mariadb driver's frozen result metadata.
  if ('what_fixed_it' in (await qi.describeTable('questions'))) {
    await qi.sequelize.query('ALTER TABLE questions DROP COLUMN what_fixed_it', { type: QueryTypes.UPDATE });
  }
}
