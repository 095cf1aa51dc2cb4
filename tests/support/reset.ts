import type { Sequelize } from 'sequelize';
import { createMigrator } from '@/lib/db/migrator';
import { seedDemo } from '@/migrations/seed/demo';

/** Refuses to touch anything but a test database. */
export function assertTestDatabase(sequelize: Sequelize) {
  const name = sequelize.getDatabaseName();
  if (!/test/.test(name)) throw new Error(`refusing to reset database "${name}": its name must contain "test"`);
}

export async function resetDatabase(sequelize: Sequelize) {
  assertTestDatabase(sequelize);
  const migrator = createMigrator(sequelize);
  await migrator.down({ to: 0 });
  await migrator.up();
  await seedDemo(sequelize);
}
