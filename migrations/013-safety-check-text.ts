import { DataTypes, QueryTypes, type QueryInterface } from 'sequelize';

/**
 * The guide file as the expert read it, kept with the check so a reader can see what
 * changed since. Medium text: a guide file is tens of kB, over TEXT's 64 kB in time.
 * Checks recorded before this column existed keep null; they show the change without a diff.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.addColumn('safety_checks', 'checked_text', { type: DataTypes.TEXT('medium'), allowNull: true });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  // Plain ALTER TABLE, as in 012: removeColumn trips over the mariadb driver's frozen metadata.
  if ('checked_text' in (await qi.describeTable('safety_checks'))) {
    await qi.sequelize.query('ALTER TABLE safety_checks DROP COLUMN checked_text', { type: QueryTypes.UPDATE });
  }
}
