import 'server-only';
import { QueryTypes, Sequelize } from 'sequelize';
import * as mariadb from 'mariadb';
import { readDbConfig, readReplicaConfig, type ReplicaAddress } from './config';
import { installReplicaFailover } from './replication';

/**
 * One Sequelize instance (and so one connection pool) per process. In development
 * Next re-evaluates modules on hot reload, so the instance lives on globalThis.
 */
const globalForDb = globalThis as unknown as { __clackwaterSequelize?: Sequelize };

/**
 * With DB_REPLICAS set, SELECTs outside a transaction go to the replicas (Sequelize's
 * read replication) and everything else to the primary; lib/db/replication.ts adds the
 * failover to the primary and read-your-writes. Without it, one pool on the primary.
 */
export function createSequelize(
  overrides: Partial<ReturnType<typeof readDbConfig>> & { replicas?: ReplicaAddress[] } = {},
): Sequelize {
  const { replicas = readReplicaConfig(), ...own } = overrides;
  const cfg = { ...readDbConfig(), ...own };
  const sequelize = new Sequelize(cfg.database, cfg.user, cfg.password, {
    host: cfg.host,
    port: cfg.port,
    ...(replicas.length
      ? {
          replication: {
            write: { host: cfg.host, port: cfg.port, username: cfg.user, password: cfg.password },
            read: replicas.map((r) => ({ host: r.host, port: r.port, username: cfg.user, password: cfg.password })),
          },
        }
      : {}),
    dialect: 'mariadb',
    dialectModule: mariadb,
    logging: process.env.DB_LOG === '1' ? console.log : false,
    pool: { max: Number(process.env.DB_POOL_MAX ?? 10), min: 0, acquire: 5_000, idle: 10_000 },
    dialectOptions: { connectTimeout: 3_000 },
    timezone: '+00:00',
    define: { underscored: true, charset: 'utf8mb4', collate: 'utf8mb4_unicode_ci' },
  });
  if (replicas.length) installReplicaFailover(sequelize);
  return sequelize;
}

export function getSequelize(): Sequelize {
  if (!globalForDb.__clackwaterSequelize) globalForDb.__clackwaterSequelize = createSequelize();
  return globalForDb.__clackwaterSequelize;
}

/** Round-trips a trivial query; used by /api/health. */
export async function pingDatabase(): Promise<{ latencyMs: number }> {
  const t0 = performance.now();
  // QueryTypes.SELECT: a RAW query trips over the mariadb driver's frozen result meta.
  // useMaster: with read replicas this is the primary's health, not a replica's
  await getSequelize().query('SELECT 1', { type: QueryTypes.SELECT, useMaster: true });
  return { latencyMs: Math.round((performance.now() - t0) * 10) / 10 };
}
