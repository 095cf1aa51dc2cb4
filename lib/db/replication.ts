import 'server-only';
import { AsyncLocalStorage } from 'node:async_hooks';
import type { Sequelize } from 'sequelize';
import { isDatabaseUnavailable } from './errors';
import { primaryWanted } from './read-your-writes';

/**
 * Read replicas that fail quietly. Sequelize's replication sends SELECTs outside a
 * transaction to its read pool and everything else to the primary, but a read pool
 * whose replica is gone just fails the query. Here a read that cannot reach a replica
 * (refused, timed out, the connection dropped under it) is answered by the primary
 * instead, and the replicas are left alone for DB_REPLICA_RETRY_S seconds before the
 * next read tries them again; one line in the log says so when it happens and one when
 * they answer again. Errors that are not about reaching the server (bad SQL, a missing
 * row) still reach the caller, and a primary that is down still answers 503.
 *
 * Two seams, both Sequelize's own: the replicated pool's `acquire` (a read whose replica
 * connection cannot be made gets a primary connection) and the instance's `query` (a
 * read whose replica connection broke mid-flight runs once more on the primary).
 * Read-your-writes rides on the `beforePoolAcquire` hook: inside `onPrimary` a SELECT
 * asks for the primary (`useMaster`), as a transaction already does.
 */
const RETRY_MS = Number(process.env.DB_REPLICA_RETRY_S ?? 5) * 1000;

type Conn = { queryType?: 'read' | 'write' };
interface ReplicatedPool {
  acquire(queryType?: string, useMaster?: boolean): Promise<Conn>;
  read: { acquire(): Promise<Conn> };
  write: { acquire(): Promise<Conn> };
}

export interface ReplicaHealth {
  /** epoch ms until which reads skip the replicas; 0 while they answer */
  downUntil: number;
  /** reads the primary answered because the replicas did not */
  fallbacks: number;
}

const health = new WeakMap<Sequelize, ReplicaHealth>();

/** The failover state of an instance made with replicas (for tests and /api/health). */
export function replicaHealth(sequelize: Sequelize): ReplicaHealth | undefined {
  return health.get(sequelize);
}

// which pool the current query's connection came from, so only a replica's failure is retried
const lastConnection = new AsyncLocalStorage<{ fromReplica: boolean }>();

export function installReplicaFailover(sequelize: Sequelize): void {
  const state: ReplicaHealth = { downUntil: 0, fallbacks: 0 };
  health.set(sequelize, state);

  const markDown = (err: unknown) => {
    if (state.downUntil === 0) {
      const e = err as { code?: string; name?: string; message?: string };
      console.warn(
        `read replicas not answering (${e.code ?? e.name ?? e.message}); reads go to the primary, retrying the replicas every ${RETRY_MS / 1000} s`,
      );
    }
    state.downUntil = Date.now() + RETRY_MS;
    state.fallbacks++;
  };
  const markUp = () => {
    if (state.downUntil !== 0) console.warn('read replicas answering again; reads go to them');
    state.downUntil = 0;
  };

  sequelize.addHook('beforePoolAcquire', (options) => {
    if (primaryWanted()) (options as { useMaster?: boolean }).useMaster = true;
  });
  sequelize.addHook('afterPoolAcquire', (connection) => {
    const probe = lastConnection.getStore();
    if (probe) probe.fromReplica = (connection as Conn).queryType === 'read';
  });

  const pool = (sequelize.connectionManager as unknown as { pool: ReplicatedPool }).pool;
  const acquire = pool.acquire.bind(pool);
  pool.acquire = async (queryType, useMaster) => {
    if (queryType !== 'SELECT' || useMaster) return acquire(queryType, useMaster);
    if (Date.now() < state.downUntil) {
      state.fallbacks++;
      return pool.write.acquire();
    }
    try {
      const connection = await pool.read.acquire();
      markUp();
      return connection;
    } catch (err) {
      if (!isDatabaseUnavailable(err)) throw err;
      markDown(err);
      return pool.write.acquire();
    }
  };

  const query = sequelize.query.bind(sequelize) as (sql: unknown, options?: object) => Promise<unknown>;
  (sequelize as unknown as { query: typeof query }).query = async (sql, options) => {
    const probe = { fromReplica: false };
    try {
      return await lastConnection.run(probe, () => query(sql, options));
    } catch (err) {
      if (!probe.fromReplica || !isDatabaseUnavailable(err)) throw err;
      markDown(err);
      return query(sql, { ...options, useMaster: true });
    }
  };
}
