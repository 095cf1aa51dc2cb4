import { mkdtempSync, readdirSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import sharp from 'sharp';
import { NextRequest } from 'next/server';
import { GET as photoGET } from '@/app/api/photos/[id]/route';
import { GET as thumbGET } from '@/app/api/photos/[id]/thumb/route';
import { initModels } from '@/models';
import { ingestUpload } from '@/lib/photos/ingest';
import { upload } from '../support/photo-upload';
import { startFakeS3, type FakeS3 } from '../support/fake-s3';
import { freshDemoDatabase } from '../support/db';

const BUCKET = 'clackwater-photos-test';
const scratch = mkdtempSync(path.join(os.tmpdir(), 'clackwater-s3-scratch-'));

describe('photos on S3-compatible storage (a fake S3 server in the test), so every instance serves the same ones', () => {
  let s3: FakeS3;
  let png: Buffer;
  const saved = { ...process.env };
  beforeAll(async () => {
    await freshDemoDatabase();
    s3 = await startFakeS3(BUCKET);
    Object.assign(process.env, {
      S3_BUCKET: BUCKET,
      S3_ENDPOINT: s3.url,
      S3_REGION: 'us-east-1',
      AWS_ACCESS_KEY_ID: 'test-only',
      AWS_SECRET_ACCESS_KEY: 'test-only',
      UPLOAD_DIR: scratch,
    });
    png = await sharp({ create: { width: 1200, height: 800, channels: 3, background: { r: 95, g: 122, b: 58 } } })
      .png()
      .toBuffer();
  });
  afterAll(async () => {
    process.env = saved;
    await s3.close();
    rmSync(scratch, { recursive: true, force: true });
  });

  it('an upload puts its two WebP copies in the bucket, keeps nothing on local disk, and is served from there', async () => {
    const res = await upload([{ name: 'ram-house.png', data: png, type: 'image/png' }]);
    expect(res.status).toBe(201);
    const [photo] = (await res.json()).photos as { id: string }[];
    expect([...s3.objects.keys()].sort()).toEqual([`photos/${photo.id}-thumb.webp`, `photos/${photo.id}.webp`]);
    expect(s3.objects.get(`photos/${photo.id}.webp`)!.contentType).toBe('image/webp');
    // only the scratch folder, emptied, is on disk
    expect(readdirSync(scratch).filter((n) => n !== 'tmp')).toEqual([]);
    expect(readdirSync(path.join(scratch, 'tmp'))).toEqual([]);

    const web = await photoGET(new NextRequest(`http://localhost/api/photos/${photo.id}`), {
      params: Promise.resolve({ id: photo.id }),
    });
    expect(web.status).toBe(200);
    expect(web.headers.get('content-type')).toBe('image/webp');
    expect(Buffer.from(await web.arrayBuffer()).equals(s3.objects.get(`photos/${photo.id}.webp`)!.body)).toBe(true);
    const thumb = await thumbGET(new NextRequest(`http://localhost/api/photos/${photo.id}/thumb`), {
      params: Promise.resolve({ id: photo.id }),
    });
    expect((await sharp(Buffer.from(await thumb.arrayBuffer())).metadata()).width).toBeLessThanOrEqual(320);
    const missing = await photoGET(new NextRequest('http://localhost/api/photos/AAAAAAAAAAAAAAAA'), {
      params: Promise.resolve({ id: 'AAAAAAAAAAAAAAAA' }),
    });
    expect(missing.status).toBe(404);
  });

  it('when the database refuses the rows, both objects are deleted from the bucket', async () => {
    const before = new Set(s3.objects.keys());
    const form = new FormData();
    form.append('photos', new File([new Uint8Array(png)], 'a.png', { type: 'image/png' }));
    // no such member: the owner_id foreign key refuses the insert after both copies are stored
    await expect(
      ingestUpload(new Request('http://localhost/api/photos', { method: 'POST', body: form }), 2_000_000_000),
    ).rejects.toMatchObject({ name: 'SequelizeForeignKeyConstraintError' });
    expect(new Set(s3.objects.keys())).toEqual(before);
    expect(s3.requests.filter((r) => r.startsWith('DELETE'))).toHaveLength(2);
  });

  it('a store that answers 503 gets a 507 with a readable message, and no row', async () => {
    const rows = await initModels().Photo.count();
    s3.failing = true;
    vi.spyOn(console, 'error').mockImplementation(() => {});
    try {
      const res = await upload([{ name: 'ram-house.png', data: png, type: 'image/png' }]);
      expect(res.status).toBe(507);
      expect((await res.json()).error.message).toMatch(/could not store photos/);
    } finally {
      s3.failing = false;
    }
    expect(await initModels().Photo.count()).toBe(rows);
  });
});
