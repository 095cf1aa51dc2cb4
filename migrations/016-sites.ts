import { DataTypes, QueryTypes, type QueryInterface } from 'sequelize';

/**
 * Sites: a member's installation, planned from a survey. Each change of the survey is a
 * new version; older versions stay readable, so a field log test can be measured against
 * the plan it was built from. Questions, field log entries and worked calculations may
 * name the site they are about (null for everything made before, or without, a site).
 */
const LINKED = ['questions', 'field_log_entries', 'worked_calculations'] as const;

export async function up({ context: qi }: { context: QueryInterface }) {
  const opts = { charset: 'utf8mb4', collate: 'utf8mb4_unicode_ci' };
  await qi.createTable(
    'sites',
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true, allowNull: false },
      // the site's address: not guessable, so a link shared on purpose is the only way in
      public_id: { type: DataTypes.STRING(16), allowNull: false, unique: true },
      owner_id: {
        type: DataTypes.INTEGER.UNSIGNED,
        allowNull: false,
        references: { model: 'users', key: 'id' },
        onDelete: 'CASCADE',
      },
      name: { type: DataTypes.STRING(80), allowNull: false },
      visibility: { type: DataTypes.ENUM('private', 'link', 'public'), allowNull: false, defaultValue: 'private' },
      created_at: { type: DataTypes.DATE, allowNull: false },
      updated_at: { type: DataTypes.DATE, allowNull: false },
    },
    opts,
  );
  await qi.addIndex('sites', ['owner_id', 'updated_at'], { name: 'sites_owner' });
  await qi.createTable(
    'site_versions',
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true, allowNull: false },
      site_id: {
        type: DataTypes.INTEGER.UNSIGNED,
        allowNull: false,
        references: { model: 'sites', key: 'id' },
        onDelete: 'CASCADE',
      },
      version: { type: DataTypes.SMALLINT.UNSIGNED, allowNull: false },
      // the survey as the member typed it, each value with its unit
      survey: { type: DataTypes.JSON, allowNull: false },
      // what the engine made of it when saved, and which engine
      plan: { type: DataTypes.JSON, allowNull: false },
      engine_version: { type: DataTypes.STRING(20), allowNull: false },
      created_at: { type: DataTypes.DATE, allowNull: false },
    },
    opts,
  );
  await qi.addIndex('site_versions', ['site_id', 'version'], { name: 'site_versions_site', unique: true });
  for (const table of LINKED) {
    await qi.addColumn(table, 'site_id', {
      type: DataTypes.INTEGER.UNSIGNED,
      allowNull: true,
      references: { model: 'sites', key: 'id' },
      onDelete: 'SET NULL',
    });
    await qi.addIndex(table, ['site_id'], { name: `${table}_site` });
  }
}

export async function down({ context: qi }: { context: QueryInterface }) {
  // Plain ALTER TABLE: queryInterface.removeColumn runs a RAW query that trips over the
  // mariadb driver's frozen result metadata.
  for (const table of LINKED) {
    if ('site_id' in (await qi.describeTable(table))) {
      const [fk] = (await qi.sequelize.query(
        `SELECT CONSTRAINT_NAME AS name FROM information_schema.KEY_COLUMN_USAGE
         WHERE TABLE_SCHEMA = DATABASE() AND TABLE_NAME = ? AND COLUMN_NAME = 'site_id' AND REFERENCED_TABLE_NAME = 'sites'`,
        { replacements: [table], type: QueryTypes.SELECT },
      )) as { name: string }[];
      if (fk)
        await qi.sequelize.query(`ALTER TABLE ${table} DROP FOREIGN KEY \`${fk.name}\``, { type: QueryTypes.UPDATE });
      await qi.sequelize.query(`ALTER TABLE ${table} DROP INDEX ${table}_site`, { type: QueryTypes.UPDATE });
      await qi.sequelize.query(`ALTER TABLE ${table} DROP COLUMN site_id`, { type: QueryTypes.UPDATE });
    }
  }
  await qi.dropTable('site_versions');
  await qi.dropTable('sites');
}
