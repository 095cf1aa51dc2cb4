import { afterAll, describe, expect, it } from 'vitest';
import { GET } from '@/app/api/health/route';
import { testDb } from '../support/db';

describe('GET /api/health', () => {
  afterAll(() => testDb('start'));

  it('reports the database up, 503 with a readable body when it is stopped, and recovers on its own', async () => {
    const up = await GET();
    expect(up.status).toBe(200);
    expect((await up.json()).database.state).toBe('up');

    testDb('stop');
    const down = await GET();
    expect(down.status).toBe(503);
    const body = await down.json();
    expect(body.database.state).toBe('down');
    expect(body.database.message).toMatch(/database is not answering/i);
    expect(JSON.stringify(body)).not.toMatch(/at .*\.(js|ts):\d+/); // no stack trace

    testDb('start');
    const again = await GET();
    expect(again.status).toBe(200);
  }, 120_000);
});
