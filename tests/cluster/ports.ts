/**
 * The cluster test's ports: CLUSTER_BASE_PORT (3700 unless set) and the next few, and
 * Redis on CLUSTER_REDIS_PORT (base + 5 unless set). Shared by the vitest config (the test
 * process's own database settings) and the test (what scripts/cluster.sh is given).
 */
const base = Number(process.env.CLUSTER_BASE_PORT ?? 3700);
export const ports = {
  balancer: base,
  appA: base + 1,
  appB: base + 2,
  db: base + 3,
  replica: base + 4,
  redis: Number(process.env.CLUSTER_REDIS_PORT ?? base + 5),
  smtp: base + 6,
};
export const BALANCER = `http://127.0.0.1:${ports.balancer}`;

/** The environment scripts/cluster.sh runs with (and so every instance). */
export const CLUSTER: Record<string, string> = {
  CLACKWATER_ENV: 'test',
  CLUSTER_PORT: String(ports.balancer),
  CLUSTER_APP_PORTS: `${ports.appA} ${ports.appB}`,
  CLUSTER_DB_PORT: String(ports.db),
  CLUSTER_REPLICA_PORT: String(ports.replica),
  CLUSTER_REDIS_PORT: String(ports.redis),
  SMTP_HOST: '127.0.0.1',
  SMTP_PORT: String(ports.smtp),
  // both workers every 2 s, so each has several turns at a message within the test
  MAIL_FLUSH_CRON: '*/2 * * * * *',
};
