import { DataTypes, type QueryInterface } from 'sequelize';

/** Experts' safety checks on guide versions, and saved worked calculations. */
export async function up({ context: qi }: { context: QueryInterface }) {
  const opts = { charset: 'utf8mb4', collate: 'utf8mb4_unicode_ci' };
  await qi.createTable(
    'safety_checks',
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true, allowNull: false },
      guide_slug: { type: DataTypes.STRING(80), allowNull: false },
      // sha256 (hex) of the guide file the expert read
      content_hash: { type: DataTypes.CHAR(64), allowNull: false },
      expert_id: {
        type: DataTypes.INTEGER.UNSIGNED,
        allowNull: false,
        references: { model: 'users', key: 'id' },
        onDelete: 'RESTRICT',
      },
      verdict: { type: DataTypes.ENUM('sound', 'needs changes'), allowNull: false },
      notes: { type: DataTypes.TEXT, allowNull: true },
      created_at: { type: DataTypes.DATE, allowNull: false },
      updated_at: { type: DataTypes.DATE, allowNull: false },
    },
    opts,
  );
  await qi.addIndex('safety_checks', ['guide_slug', 'created_at'], { name: 'safety_checks_guide_created' });

  await qi.createTable(
    'worked_calculations',
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true, allowNull: false },
      // the permalink's id: random, so permalinks cannot be walked
      public_id: { type: DataTypes.STRING(16), allowNull: false, unique: true },
      tool: { type: DataTypes.STRING(40), allowNull: false },
      inputs: { type: DataTypes.JSON, allowNull: false },
      results: { type: DataTypes.JSON, allowNull: false },
      engine_version: { type: DataTypes.STRING(20), allowNull: false },
      title: { type: DataTypes.STRING(160), allowNull: true },
      author_id: {
        type: DataTypes.INTEGER.UNSIGNED,
        allowNull: true,
        references: { model: 'users', key: 'id' },
        onDelete: 'SET NULL',
      },
      created_at: { type: DataTypes.DATE, allowNull: false },
      updated_at: { type: DataTypes.DATE, allowNull: false },
    },
    opts,
  );
  await qi.addIndex('worked_calculations', ['author_id', 'created_at'], { name: 'worked_calculations_author' });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('worked_calculations');
  await qi.dropTable('safety_checks');
}
