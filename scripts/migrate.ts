/**
 * npm run db:migrate   — apply every pending migration
 * npm run db:rollback  — undo the last one (`-- --to 0` undoes them all)
 */
import { getSequelize } from '@/lib/db';
import { createMigrator } from '@/lib/db/migrator';

async function main() {
  const [cmd = 'up', ...rest] = process.argv.slice(2);
  const sequelize = getSequelize();
  const migrator = createMigrator(sequelize);
  try {
    if (cmd === 'up') {
      const done = await migrator.up();
      console.log(done.length ? `migrated: ${done.map((m) => m.name).join(', ')}` : 'migrations: up to date');
    } else if (cmd === 'down') {
      const toAll = rest[0] === '--to' && rest[1] === '0';
      const done = await migrator.down(toAll ? { to: 0 } : undefined);
      console.log(done.length ? `rolled back: ${done.map((m) => m.name).join(', ')}` : 'nothing to roll back');
    } else {
      throw new Error(`unknown command ${cmd}: use up or down`);
    }
  } finally {
    await sequelize.close();
  }
}

main().catch((err) => {
  console.error(`migration failed: ${err instanceof Error ? err.message : String(err)}`);
  process.exit(1);
});
