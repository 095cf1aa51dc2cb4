import { mkdtempSync, readdirSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { NextRequest } from 'next/server';
import sharp from 'sharp';
import { POST } from '@/app/api/photos/route';
import { initModels } from '@/models';
import { freshDemoDatabase } from '../support/db';
import { sessionCookie } from '../support/act-as';

/**
 * Issue 24: a photo kept on a phone with no signal is sent from its outbox with an
 * Idempotency-Key, so an upload whose answer was lost and is sent again is one photo.
 */
const uploadDir = mkdtempSync(path.join(os.tmpdir(), 'clackwater-photo-once-'));
process.env.UPLOAD_DIR = uploadDir;

const MEMBER = 'ferncombe_tamsin';
let jpeg: Buffer;
let other: Buffer;

async function send(data: Buffer, key?: string, as = MEMBER) {
  const form = new FormData();
  form.append('photos', new File([new Uint8Array(data)], 'ram-house.jpg', { type: 'image/jpeg' }));
  const headers: Record<string, string> = { cookie: await sessionCookie(as) };
  if (key) headers['Idempotency-Key'] = key;
  return POST(new NextRequest('http://localhost/api/photos', { method: 'POST', body: form, headers }));
}
const photoRows = () => initModels().Photo.count();
/** The stored copies (two a photo), not the scratch directory. */
const storedFiles = () => readdirSync(uploadDir).filter((f) => f !== 'tmp');

beforeAll(async () => {
  await freshDemoDatabase();
  jpeg = await sharp({ create: { width: 640, height: 480, channels: 3, background: { r: 95, g: 122, b: 58 } } })
    .jpeg()
    .toBuffer();
  other = await sharp({ create: { width: 640, height: 480, channels: 3, background: { r: 181, g: 86, b: 43 } } })
    .jpeg()
    .toBuffer();
});
afterAll(() => rmSync(uploadDir, { recursive: true, force: true }));

describe('POST /api/photos with an Idempotency-Key', () => {
  it('stores the photo once however often the same key is sent, and answers with the same photo', async () => {
    const rows = await photoRows();
    const key = 'c0ffee00-aaaa-4bbb-8ccc-000000000001-photo-0';
    const first = await send(jpeg, key);
    expect(first.status).toBe(201);
    const { photos } = await first.json();
    const files = storedFiles();
    const again = await send(jpeg, key);
    expect(again.status).toBe(201);
    expect((await again.json()).photos).toEqual(photos);
    // one row and its two copies (web and thumb, lib/photos/storage.ts), nothing from the repeat
    expect(await photoRows()).toBe(rows + 1);
    expect(storedFiles()).toEqual(files);
  });

  it('sent twice at the same moment, one photo', async () => {
    const rows = await photoRows();
    const key = 'c0ffee00-aaaa-4bbb-8ccc-000000000002-photo-0';
    const [a, b] = await Promise.all([send(jpeg, key), send(jpeg, key)]);
    expect([a.status, b.status]).toEqual([201, 201]);
    expect((await a.json()).photos).toEqual((await b.json()).photos);
    expect(await photoRows()).toBe(rows + 1);
  });

  it('refuses one key for a different photo, and keeps nothing of it', async () => {
    const key = 'c0ffee00-aaaa-4bbb-8ccc-000000000003-photo-0';
    expect((await send(jpeg, key)).status).toBe(201);
    const rows = await photoRows();
    const files = storedFiles();
    const res = await send(other, key);
    expect(res.status).toBe(422);
    expect((await res.json()).error).toMatchObject({ field: 'Idempotency-Key' });
    expect(await photoRows()).toBe(rows);
    expect(storedFiles()).toEqual(files);
  });

  it('keeps keys apart by member, and refuses a malformed key naming the header', async () => {
    const key = 'c0ffee00-aaaa-4bbb-8ccc-000000000004-photo-0';
    const rows = await photoRows();
    expect((await send(jpeg, key)).status).toBe(201);
    expect((await send(jpeg, key, 'highcrag_shepherd')).status).toBe(201);
    expect(await photoRows()).toBe(rows + 2);
    const bad = await send(jpeg, 'no spaces allowed');
    expect(bad.status).toBe(400);
    expect((await bad.json()).error).toMatchObject({ field: 'Idempotency-Key' });
  });

  it('without a key, each upload is its own photo (as before)', async () => {
    const rows = await photoRows();
    await send(jpeg);
    await send(jpeg);
    expect(await photoRows()).toBe(rows + 2);
  });
});
