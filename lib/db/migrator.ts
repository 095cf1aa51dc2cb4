import 'server-only';
import { Umzug, SequelizeStorage } from 'umzug';
import type { Sequelize } from 'sequelize';
import { migrations } from '@/migrations';

/** The umzug migrator over migrations/, recording applied steps in `schema_migrations`. */
export function createMigrator(sequelize: Sequelize) {
  return new Umzug({
    migrations: migrations.map((m) => ({ name: m.name, up: m.up, down: m.down })),
    context: sequelize.getQueryInterface(),
    storage: new SequelizeStorage({ sequelize, tableName: 'schema_migrations' }),
    logger: undefined,
  });
}
