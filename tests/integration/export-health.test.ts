import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { NextRequest } from 'next/server';
import { GET as health } from '@/app/api/health/route';
import { GET as exportCsvRoute } from '@/app/api/field-log/export/route';
import { GET as list } from '@/app/api/field-log/route';
import { QueryTypes } from 'sequelize';
import { getSequelize } from '@/lib/db';
import { closeHealthConnection } from '@/lib/db/health';
import { EXPORT_CONNECTIONS } from '@/lib/field-log/export-gate';
import { freshDemoDatabase } from '../support/db';

/** The pool Sequelize keeps (sequelize-pool): how many connections are lent out right now. */
function pool() {
  return (getSequelize().connectionManager as unknown as { pool: { using: number; maxSize: number } }).pool;
}

async function timedHealth() {
  const t0 = performance.now();
  const res = await health();
  return { status: res.status, ms: performance.now() - t0 };
}

const exportOnce = async () => {
  const res = await exportCsvRoute(new NextRequest('http://localhost/api/field-log/export?sort=efficiency'));
  return (await res.text()).trim().split('\r\n').length - 1;
};

describe('field log export and /api/health under load (issue 17, item 15)', () => {
  beforeAll(freshDemoDatabase);
  afterAll(closeHealthConnection);

  it('answers /api/health at once while every pooled connection is busy', async () => {
    await health(); // open the health connection, as a running server has
    const max = pool().maxSize;
    // hold every connection of the pool for 3 s
    const sleepers = Array.from({ length: max }, () =>
      getSequelize().query('SELECT SLEEP(3)', { type: QueryTypes.SELECT }),
    );
    await new Promise((r) => setTimeout(r, 200));
    expect(pool().using).toBe(max);
    const during = await timedHealth();
    await Promise.all(sleepers);
    expect(during.status).toBe(200);
    // a pooled ping would wait ~3 s for a free connection; 1 s is a loose bound on loopback (common practice, no source)
    expect(during.ms).toBeLessThan(1_000);
  }, 30_000);

  it('streams 60 exports at once through at most EXPORT_CONNECTIONS connections, each complete, with health fast throughout', async () => {
    const total = (await (await list(new NextRequest('http://localhost/api/field-log?perPage=1'))).json())
      .total as number;
    let most = 0;
    const sampler = setInterval(() => {
      most = Math.max(most, pool().using);
    }, 2);
    const healthTimes: number[] = [];
    const probe = (async () => {
      for (let i = 0; i < 10; i++) {
        healthTimes.push((await timedHealth()).ms);
        await new Promise((r) => setTimeout(r, 20));
      }
    })();
    const rows = await Promise.all(Array.from({ length: 60 }, exportOnce));
    await probe;
    clearInterval(sampler);
    expect(rows.every((n) => n === total)).toBe(true);
    expect(most).toBeLessThanOrEqual(EXPORT_CONNECTIONS);
    expect(Math.max(...healthTimes)).toBeLessThan(1_000); // loose bound on loopback (common practice, no source)
  }, 60_000);
});
