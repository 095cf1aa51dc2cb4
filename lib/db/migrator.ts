import 'server-only';
import { Umzug, SequelizeStorage } from 'umzug';
import type { Sequelize } from 'sequelize';
import { migrations } from '@/migrations';
import { onPrimary } from './read-your-writes';

/**
 * The umzug migrator over migrations/, recording applied steps in `schema_migrations`.
 * Its steps read what the step before wrote (the record of applied steps, a table just
 * made), so with read replicas everything it does reads the primary.
 */
export function createMigrator(sequelize: Sequelize) {
  const umzug = new Umzug({
    migrations: migrations.map((m) => ({ name: m.name, up: m.up, down: m.down })),
    context: sequelize.getQueryInterface(),
    storage: new SequelizeStorage({ sequelize, tableName: 'schema_migrations' }),
    logger: undefined,
  });
  const { up, down, pending, executed } = umzug;
  umzug.up = (options) => onPrimary(() => up.call(umzug, options));
  umzug.down = (options) => onPrimary(() => down.call(umzug, options));
  umzug.pending = () => onPrimary(() => pending.call(umzug));
  umzug.executed = () => onPrimary(() => executed.call(umzug));
  return umzug;
}
