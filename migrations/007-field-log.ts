import { DataTypes, QueryTypes, type QueryInterface } from 'sequelize';

/**
 * Field log: measured tests of installations, their bucket-and-stopwatch trials,
 * before/after links between entries on one site, and a question's link to an entry.
 * Measurements are stored in SI and, in `typed`, as the member entered them.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  const opts = { charset: 'utf8mb4', collate: 'utf8mb4_unicode_ci' };
  const ref = (model: string, allowNull = false, onDelete = 'RESTRICT') => ({
    type: DataTypes.INTEGER.UNSIGNED,
    allowNull,
    references: { model, key: 'id' },
    onDelete: allowNull ? 'SET NULL' : onDelete,
  });
  const si = (allowNull = false) => ({ type: DataTypes.DOUBLE, allowNull });
  await qi.createTable(
    'field_log_entries',
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true, allowNull: false },
      author_id: ref('users'),
      site_name: { type: DataTypes.STRING(80), allowNull: false },
      tested_on: { type: DataTypes.DATEONLY, allowNull: false },
      pump_type: { type: DataTypes.ENUM('homemade', 'commercial'), allowNull: false },
      pump_size: { type: DataTypes.STRING(8), allowNull: false },
      pump_count: { type: DataTypes.TINYINT.UNSIGNED, allowNull: false },
      arrangement: { type: DataTypes.ENUM('single', 'parallel', 'staged'), allowNull: false },
      fall_m: si(),
      lift_m: si(),
      drive_length_m: si(),
      drive_size: { type: DataTypes.STRING(8), allowNull: false },
      drive_material: { type: DataTypes.STRING(20), allowNull: false },
      delivery_length_m: si(true),
      delivery_size: { type: DataTypes.STRING(8), allowNull: true },
      delivery_material: { type: DataTypes.STRING(20), allowNull: true },
      drive_flow_m3s: si(),
      drive_flow_method: { type: DataTypes.ENUM('measured', 'estimated'), allowNull: false },
      drive_flow_how: { type: DataTypes.STRING(300), allowNull: false, defaultValue: '' },
      delivered_flow_m3s: si(),
      beats_per_minute: si(true),
      waste_valve_setting: { type: DataTypes.STRING(200), allowNull: false, defaultValue: '' },
      water_temp_c: si(true),
      notes: { type: DataTypes.TEXT, allowNull: false },
      typed: { type: DataTypes.JSON, allowNull: false },
      hidden_at: { type: DataTypes.DATE, allowNull: true },
      hidden_reason: { type: DataTypes.STRING(300), allowNull: true },
      deleted_at: { type: DataTypes.DATE, allowNull: true },
      created_at: { type: DataTypes.DATE, allowNull: false },
      updated_at: { type: DataTypes.DATE, allowNull: false },
    },
    opts,
  );
  await qi.addIndex('field_log_entries', ['author_id'], { name: 'field_log_entries_author' });
  await qi.addIndex('field_log_entries', ['pump_size', 'drive_material'], { name: 'field_log_entries_filter' });
  await qi.createTable(
    'field_log_trials',
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true, allowNull: false },
      entry_id: {
        type: DataTypes.INTEGER.UNSIGNED,
        allowNull: false,
        references: { model: 'field_log_entries', key: 'id' },
        onDelete: 'CASCADE',
      },
      position: { type: DataTypes.TINYINT.UNSIGNED, allowNull: false },
      volume_l: si(),
      seconds: si(),
    },
    opts,
  );
  await qi.addIndex('field_log_trials', ['entry_id', 'position'], { name: 'field_log_trials_entry', unique: true });
  await qi.createTable(
    'field_log_links',
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true, allowNull: false },
      before_id: {
        type: DataTypes.INTEGER.UNSIGNED,
        allowNull: false,
        references: { model: 'field_log_entries', key: 'id' },
        onDelete: 'CASCADE',
      },
      after_id: {
        type: DataTypes.INTEGER.UNSIGNED,
        allowNull: false,
        references: { model: 'field_log_entries', key: 'id' },
        onDelete: 'CASCADE',
      },
      what_changed: { type: DataTypes.STRING(300), allowNull: false },
      created_by: ref('users'),
      created_at: { type: DataTypes.DATE, allowNull: false },
    },
    opts,
  );
  await qi.addIndex('field_log_links', ['before_id', 'after_id'], { name: 'field_log_links_pair', unique: true });
  await qi.addColumn('questions', 'field_log_entry_id', ref('field_log_entries', true));
  await qi.addColumn('photos', 'field_log_entry_id', ref('field_log_entries', true));
}

export async function down({ context: qi }: { context: QueryInterface }) {
  for (const t of ['questions', 'photos']) {
    const present = Object.keys(await qi.describeTable(t));
    if (present.includes('field_log_entry_id')) {
      const fks = await qi.sequelize.query<{ CONSTRAINT_NAME: string }>(
        `SELECT CONSTRAINT_NAME FROM information_schema.KEY_COLUMN_USAGE WHERE TABLE_SCHEMA = DATABASE() AND TABLE_NAME = '${t}' AND COLUMN_NAME = 'field_log_entry_id' AND REFERENCED_TABLE_NAME IS NOT NULL`,
        { type: QueryTypes.SELECT },
      );
      // plain ALTERs with an UPDATE type: a RAW result trips over the mariadb driver's frozen metadata
      const drops = [
        ...fks.map((fk) => `DROP FOREIGN KEY \`${fk.CONSTRAINT_NAME}\``),
        'DROP COLUMN field_log_entry_id',
      ];
      await qi.sequelize.query(`ALTER TABLE ${t} ${drops.join(', ')}`, { type: QueryTypes.UPDATE });
    }
  }
  await qi.dropTable('field_log_links');
  await qi.dropTable('field_log_trials');
  await qi.dropTable('field_log_entries');
}
