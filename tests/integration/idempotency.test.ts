import { beforeAll, describe, expect, it } from 'vitest';
import { POST as create } from '@/app/api/field-log/route';
import { initModels } from '@/models';
import { actAs } from '../support/act-as';
import { freshDemoDatabase } from '../support/db';

const { call } = actAs('10.57');

/** A test recorded at the water and sent when the phone found a signal (an invented site). */
const entry = (notes: string) => ({
  siteName: 'Hollin spring, below the sheepfold',
  testedOn: '2026-06-02',
  pumpSize: '1',
  fall: '5 ft',
  lift: '40 ft',
  driveLength: '40 ft',
  driveSize: '1',
  driveMaterial: 'pvc',
  driveFlow: '6 gal/min',
  driveFlowMethod: 'measured',
  driveFlowHow: 'the waste water caught in a bucket',
  trials: [
    { volume: '1 gal', seconds: 95 },
    { volume: '1 gal', seconds: 100 },
    { volume: '1 gal', seconds: 98 },
  ],
  bpm: 55,
  notes,
});

const entries = (notes: string) => initModels().FieldLogEntry.count({ where: { notes } });
const send = (key: string | undefined, body: unknown, who = 'sorrel_cabin') =>
  call(create, 'POST', '/api/field-log', who, body, {}, key ? { 'Idempotency-Key': key } : {});

describe('a record sent more than once is written once', () => {
  beforeAll(freshDemoDatabase);

  it('answers a repeat with the first answer and writes nothing more', async () => {
    const body = entry('sent twice: the first answer was lost');
    const first = await send('0b6f3c2e-5d1a-4c39-9a77-1f2e3d4c5b6a', body);
    expect(first.status).toBe(201);
    const again = await send('0b6f3c2e-5d1a-4c39-9a77-1f2e3d4c5b6a', body);
    expect(again.status).toBe(201);
    expect(again.body).toEqual(first.body);
    expect(await entries(body.notes)).toBe(1);
  });

  it('writes one when two sends with one key arrive at once', async () => {
    const body = entry('sent twice at the same moment');
    const key = 'a1b2c3d4-0000-4000-8000-000000000002';
    const [a, b] = await Promise.all([send(key, body), send(key, body)]);
    expect([a.status, b.status]).toEqual([201, 201]);
    expect(a.body.id).toBe(b.body.id);
    expect(await entries(body.notes)).toBe(1);
  });

  it('keeps keys apart per member, and without a key every send is a new record', async () => {
    const body = entry('two members, one key');
    const key = 'shared-key-0003';
    const mine = await send(key, body, 'sorrel_cabin');
    const theirs = await send(key, body, 'ferncombe_tamsin');
    expect(mine.status).toBe(201);
    expect(theirs.status).toBe(201);
    expect(theirs.body.id).not.toBe(mine.body.id);
    const plain = entry('no key at all');
    await send(undefined, plain);
    await send(undefined, plain);
    expect(await entries(plain.notes)).toBe(2);
  });

  it('refuses a key used for a different record, and a malformed key, naming the header', async () => {
    const key = 'reused-key-0004';
    expect((await send(key, entry('the first record'))).status).toBe(201);
    const other = await send(key, entry('a different record'));
    expect(other.status).toBe(422);
    expect(other.body.error.field).toBe('Idempotency-Key');
    expect(await entries('a different record')).toBe(0);
    const bad = await send('short', entry('a malformed key'));
    expect(bad.status).toBe(400);
    expect(bad.body.error.field).toBe('Idempotency-Key');
    expect(await entries('a malformed key')).toBe(0);
  });

  it('keeps no key when the record is refused, so the member can fix it and send again', async () => {
    const key = 'refused-then-fixed-0005';
    const bad = { ...entry('lift below the fall'), lift: '2 ft' };
    const refused = await send(key, bad);
    expect(refused.status).toBeGreaterThanOrEqual(400);
    expect(refused.status).toBeLessThan(500);
    // a refusal writes nothing, so the same key carries the corrected record
    const fixed = await send(key, entry('lift below the fall'));
    expect(fixed.status).toBe(201);
    expect(await entries('lift below the fall')).toBe(1);
  });
});
