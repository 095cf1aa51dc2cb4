import { mkdtempSync, readdirSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import zlib from 'node:zlib';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { NextRequest } from 'next/server';
import sharp from 'sharp';
import { POST } from '@/app/api/photos/route';
import { GET as getWeb } from '@/app/api/photos/[id]/route';
import { GET as getThumb } from '@/app/api/photos/[id]/thumb/route';
import { limits } from '@/lib/auth/rate-limit';
import { ingestUpload } from '@/lib/photos/ingest';
import { PHOTO_MESSAGES } from '@/lib/photos/limits';
import { attachPhotos } from '@/lib/photos/store';
import { isStorageUnavailable, photoPath } from '@/lib/photos/storage';
import { initModels } from '@/models';
import { freshDemoDatabase } from '../support/db';
import { upload as uploadAs, type Part } from '../support/photo-upload';
import { sessionCookie } from '../support/act-as';

// A fresh upload directory for this file; the storage module reads UPLOAD_DIR on every call.
const uploadDir = mkdtempSync(path.join(os.tmpdir(), 'clackwater-photos-'));
process.env.UPLOAD_DIR = uploadDir;

const MEMBER = 'highcrag_shepherd';
const OTHER = 'ferncombe_tamsin';

const upload = (parts: Part[], opts: { as?: string | null; alt?: string[] } = {}) =>
  uploadAs(parts, { as: opts.as === undefined ? MEMBER : opts.as, alt: opts.alt ?? [] });

const ctx = (id: string) => ({ params: Promise.resolve({ id }) });

/** A PNG built by hand: a valid IHDR claiming `w`×`h` (1-bit grey) and one tiny IDAT. */
function claimedPng(w: number, h: number): Buffer {
  const chunk = (type: string, data: Buffer) => {
    const len = Buffer.alloc(4);
    len.writeUInt32BE(data.length);
    const body = Buffer.concat([Buffer.from(type, 'ascii'), data]);
    const crc = Buffer.alloc(4);
    crc.writeUInt32BE(zlib.crc32(body));
    return Buffer.concat([len, body, crc]);
  };
  const ihdr = Buffer.alloc(13);
  ihdr.writeUInt32BE(w, 0);
  ihdr.writeUInt32BE(h, 4);
  ihdr[8] = 1; // bit depth
  ihdr[9] = 0; // greyscale
  const signature = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]); // PNG spec (W3C PNG 2nd ed., 5.2)
  return Buffer.concat([
    signature,
    chunk('IHDR', ihdr),
    chunk('IDAT', zlib.deflateSync(Buffer.alloc(2))),
    chunk('IEND', Buffer.alloc(0)),
  ]);
}

let png: Buffer;
let jpegWithExif: Buffer;
let largePng: Buffer;

/** Everything in the upload directory except the (empty) tmp directory. */
function storedFiles(): string[] {
  return readdirSync(uploadDir).filter((f) => f !== 'tmp');
}
async function expectNothingKept(before: string[]) {
  expect(storedFiles()).toEqual(before);
  const tmp = path.join(uploadDir, 'tmp');
  expect(readdirSync(tmp)).toEqual([]);
  const { Photo } = initModels();
  expect(await Photo.count()).toBe(photoRowsBefore);
}
let photoRowsBefore = 0;

beforeAll(async () => {
  await freshDemoDatabase();
  png = await sharp({ create: { width: 2400, height: 1200, channels: 3, background: { r: 31, g: 58, b: 61 } } })
    .png()
    .toBuffer();
  jpegWithExif = await sharp({ create: { width: 800, height: 600, channels: 3, background: { r: 181, g: 86, b: 43 } } })
    .jpeg()
    .withMetadata({ exif: { IFD0: { Copyright: 'x' } } })
    .toBuffer();
  // random noise does not compress, so this PNG is bigger than the 8 MB per-file limit
  const side = 1800; // 1800² × 3 channels ≈ 9.7 MB of raw noise (arithmetic)
  largePng = await sharp(Buffer.from(Array.from({ length: side * side * 3 }, () => (Math.random() * 256) | 0)), {
    raw: { width: side, height: side, channels: 3 },
  })
    .png({ compressionLevel: 0 })
    .toBuffer();
});
beforeEach(async () => {
  photoRowsBefore = await initModels().Photo.count();
});
afterAll(() => rmSync(uploadDir, { recursive: true, force: true }));

describe('POST /api/photos', () => {
  it('stores a PNG as two re-encoded WebP copies within the size limits', async () => {
    const res = await upload([{ name: 'brook-intake.png', data: png, type: 'image/png' }], {
      alt: ['Intake box on the brook'],
    });
    expect(res.status).toBe(201);
    const { photos } = await res.json();
    expect(photos).toHaveLength(1);
    const [p] = photos;
    expect(p.id).toMatch(/^[0-9A-Za-z]{16}$/); // id format chosen in lib/photos/storage.ts
    expect(p).toMatchObject({
      width: 1600,
      height: 800,
      url: `/api/photos/${p.id}`,
      thumbUrl: `/api/photos/${p.id}/thumb`,
    }); // 2400×1200 fitted inside 1600 px, limit chosen in lib/photos/ingest.ts
    const web = await sharp(photoPath(p.id, 'web')).metadata();
    const thumb = await sharp(photoPath(p.id, 'thumb')).metadata();
    expect([web.format, web.width, web.height]).toEqual(['webp', 1600, 800]); // limit chosen in lib/photos/ingest.ts
    expect([thumb.format, thumb.width, thumb.height]).toEqual(['webp', 320, 160]); // 320 px thumbnail, limit chosen in lib/photos/ingest.ts
    const row = await initModels().Photo.findOne({ where: { publicId: p.id } });
    expect(row).toMatchObject({
      mime: 'image/webp',
      width: 1600,
      height: 800,
      questionId: null,
      answerId: null,
      alt: 'Intake box on the brook',
    });
    expect(readdirSync(path.join(uploadDir, 'tmp'))).toEqual([]);
  });

  it('strips EXIF from a JPEG', async () => {
    expect((await sharp(jpegWithExif).metadata()).exif).toBeDefined();
    const res = await upload([{ name: 'ram.jpg', data: jpegWithExif, type: 'image/jpeg' }]);
    expect(res.status).toBe(201);
    const [p] = (await res.json()).photos;
    expect(p).toMatchObject({ width: 800, height: 600 }); // smaller than 1600 px: never enlarged (lib/photos/ingest.ts)
    for (const variant of ['web', 'thumb'] as const) {
      const meta = await sharp(photoPath(p.id, variant)).metadata();
      expect(meta.exif).toBeUndefined();
      expect(meta.xmp).toBeUndefined();
    }
  });

  it('names files only by random id: a path-traversal filename lands nowhere else', async () => {
    const before = readdirSync(uploadDir);
    const res = await upload([{ name: '../../etc/passwd.png', data: png, type: 'image/png' }]);
    expect(res.status).toBe(201);
    const [p] = (await res.json()).photos;
    const added = readdirSync(uploadDir)
      .filter((f) => !before.includes(f))
      .sort();
    expect(added).toEqual([`${p.id}-thumb.webp`, `${p.id}.webp`]);
    expect(readdirSync(path.dirname(uploadDir)).some((f) => f === 'passwd.png' || f === 'etc')).toBe(false);
  });

  it('refuses a text file named photo.jpg with 415 naming it, keeping nothing', async () => {
    const before = storedFiles();
    const res = await upload([
      { name: 'photo.jpg', data: 'not a picture, just words about a waste valve\n', type: 'image/jpeg' },
    ]);
    expect(res.status).toBe(415);
    expect((await res.json()).error.message).toContain('photo.jpg');
    await expectNothingKept(before);
  });

  it('refuses the whole upload when one file of several is bad: all or nothing', async () => {
    const before = storedFiles();
    const res = await upload([
      { name: 'good.png', data: png, type: 'image/png' },
      { name: 'notes.jpg', data: 'plain text', type: 'image/jpeg' },
    ]);
    expect(res.status).toBe(415);
    expect((await res.json()).error.message).toContain('notes.jpg');
    await expectNothingKept(before);
  });

  it('refuses an image bomb (header claims 30000×30000) from its metadata, before decoding', async () => {
    const before = storedFiles();
    const bomb = claimedPng(30_000, 30_000);
    expect(bomb.length).toBeLessThan(200); // a few chunks of bytes (arithmetic on the chunks above)
    const res = await upload([{ name: 'bomb.png', data: bomb, type: 'image/png' }]);
    expect(res.status).toBe(413);
    const { error } = await res.json();
    expect(error.message).toContain('bomb.png');
    expect(error.message).toContain('40 megapixels'); // limit chosen in lib/photos/ingest.ts
    await expectNothingKept(before);
  });

  it('refuses an image over 12,000 px on a side even when its pixel count is small', async () => {
    const before = storedFiles();
    const res = await upload([{ name: 'strip.png', data: claimedPng(12_001, 10), type: 'image/png' }]); // one past the side limit chosen in lib/photos/ingest.ts
    expect(res.status).toBe(413);
    expect((await res.json()).error.message).toContain('12,000 px'); // limit chosen in lib/photos/ingest.ts
    await expectNothingKept(before);
  });

  it('refuses a file over 8 MB with 413 saying the limit', async () => {
    expect(largePng.length).toBeGreaterThan(8 * 1024 * 1024); // limit chosen in lib/photos/ingest.ts
    const before = storedFiles();
    const res = await upload([{ name: 'huge.png', data: largePng, type: 'image/png' }]);
    expect(res.status).toBe(413);
    const { error } = await res.json();
    expect(error.message).toContain('8 MB'); // limit chosen in lib/photos/ingest.ts
    expect(error.message).toContain('huge.png');
    // the picker refuses with the same sentence before uploading (tests/unit/photo-picker.test.tsx)
    expect(error.message).toBe(PHOTO_MESSAGES.fileTooLarge('huge.png'));
    await expectNothingKept(before);
  });

  it('refuses more than 6 files', async () => {
    const before = storedFiles();
    const seven = Array.from({ length: 7 }, (_, i) => ({ name: `p${i}.png`, data: png, type: 'image/png' })); // one past the 6 chosen in lib/photos/ingest.ts
    const res = await upload(seven);
    expect(res.status).toBe(413);
    await expectNothingKept(before);
  });

  it('refuses a zero-byte file with 400', async () => {
    const before = storedFiles();
    const res = await upload([{ name: 'empty.png', data: Buffer.alloc(0), type: 'image/png' }]);
    expect(res.status).toBe(400);
    expect((await res.json()).error.message).toContain('empty.png');
    await expectNothingKept(before);
  });

  it('answers 400 when no photo is sent', async () => {
    const before = storedFiles();
    const form = new FormData();
    form.append('alt', 'nothing here');
    const req = new NextRequest('http://localhost/api/photos', {
      method: 'POST',
      body: form,
      headers: { cookie: await sessionCookie(MEMBER) },
    });
    const res = await POST(req);
    expect(res.status).toBe(400);
    expect((await res.json()).error.code).toBe('no_file');
    await expectNothingKept(before);
  });

  it('answers 400 to a signed-in JSON body, 401 to a signed-out caller', async () => {
    const json = await POST(
      new NextRequest('http://localhost/api/photos', {
        method: 'POST',
        body: '{}',
        headers: { 'content-type': 'application/json', cookie: await sessionCookie(MEMBER) },
      }),
    );
    expect(json.status).toBe(400);
    const before = storedFiles();
    const res = await upload([{ name: 'a.png', data: png, type: 'image/png' }], { as: null });
    expect(res.status).toBe(401);
    await expectNothingKept(before);
  });

  it('limits uploads per account with 429 and Retry-After', async () => {
    const { User } = initModels();
    const other = (await User.findOne({ where: { handle: OTHER } }))!;
    await limits().uploadAccount.penalty(String(other.id), 30); // the 30 an hour chosen in lib/auth/rate-limit.ts
    const res = await upload([{ name: 'a.png', data: png, type: 'image/png' }], { as: OTHER });
    expect(res.status).toBe(429);
    expect(Number(res.headers.get('retry-after'))).toBeGreaterThan(0);
    await limits().uploadAccount.delete(String(other.id));
  });

  it('limits uploads per address too, whoever is signed in', async () => {
    await limits().uploadIp.penalty('local', 90); // the 90 an hour per address chosen in lib/auth/rate-limit.ts; requests here carry no proxy header
    const before = storedFiles();
    const res = await upload([{ name: 'a.png', data: png, type: 'image/png' }], { as: OTHER });
    expect(res.status).toBe(429);
    expect(Number(res.headers.get('retry-after'))).toBeGreaterThan(0);
    await expectNothingKept(before);
    await limits().uploadIp.delete('local');
  });
});

describe('GET /api/photos/:id and /thumb', () => {
  it('serves our WebP copies with nosniff and an hour of caching', async () => {
    const [p] = (await (await upload([{ name: 'a.png', data: png, type: 'image/png' }])).json()).photos;
    for (const res of [
      await getWeb(new Request(`http://localhost${p.url}`), ctx(p.id)),
      await getThumb(new Request(`http://localhost${p.thumbUrl}`), ctx(p.id)),
    ]) {
      expect(res.status).toBe(200);
      expect(res.headers.get('content-type')).toBe('image/webp');
      expect(res.headers.get('x-content-type-options')).toBe('nosniff');
      expect(res.headers.get('cache-control')).toBe('public, max-age=3600'); // an hour, so a photo taken down leaves readers' caches soon: common practice, no source
      expect(res.headers.get('content-disposition')).toMatch(/^inline/);
      expect((await sharp(Buffer.from(await res.arrayBuffer())).metadata()).format).toBe('webp');
    }
  });

  it.each(['AAAAAAAAAAAAAAAA', '..%2F..%2Fetc%2Fpasswd', '../../etc/passwd', 'short', 'tmp'])(
    'answers 404 for %s',
    async (id) => {
      expect((await getWeb(new Request('http://localhost/api/photos/x'), ctx(id))).status).toBe(404);
      expect((await getThumb(new Request('http://localhost/api/photos/x/thumb'), ctx(id))).status).toBe(404);
    },
  );
});

describe('attachPhotos', () => {
  it("attaches only the owner's own unattached photos and says how many", async () => {
    const { Photo, Question, User } = initModels();
    const question = (await Question.findOne())!;
    const member = (await User.findOne({ where: { handle: MEMBER } }))!;
    const other = (await User.findOne({ where: { handle: OTHER } }))!;
    const mine = (
      await (
        await upload([
          { name: 'a.png', data: png, type: 'image/png' },
          { name: 'b.jpg', data: jpegWithExif, type: 'image/jpeg' },
        ])
      ).json()
    ).photos.map((p: { id: string }) => p.id);
    expect(await attachPhotos(mine, other.id, { questionId: question.id })).toBe(0);
    expect(await attachPhotos([...mine, 'not-an-id', mine[0]], member.id, { questionId: question.id })).toBe(2); // the two uploaded just above
    expect(await attachPhotos(mine, member.id, { questionId: question.id })).toBe(0);
    expect(await Photo.count({ where: { questionId: question.id } })).toBe(2); // the two uploaded just above
  });
});

describe('storage errors', () => {
  it('removes the written copies when the database refuses the rows', async () => {
    const before = storedFiles();
    const rows = await initModels().Photo.count();
    const form = new FormData();
    form.append('photos', new File([new Uint8Array(png)], 'a.png', { type: 'image/png' }));
    // no such member: the owner_id foreign key refuses the insert after both copies are on disk
    await expect(
      ingestUpload(new Request('http://localhost/api/photos', { method: 'POST', body: form }), 2_000_000_000),
    ).rejects.toMatchObject({ name: 'SequelizeForeignKeyConstraintError' });
    expect(storedFiles()).toEqual(before);
    expect(readdirSync(path.join(uploadDir, 'tmp'))).toEqual([]);
    expect(await initModels().Photo.count()).toBe(rows);
  });

  // a full or read-only upload directory, end to end: tests/reliability/upload-storage.test.ts
  it('treats a full, read-only or forbidden disk as storage unavailable (507), and nothing else', () => {
    for (const code of ['ENOSPC', 'EACCES', 'EROFS'])
      expect(isStorageUnavailable(Object.assign(new Error(code), { code }))).toBe(true);
    for (const code of ['ENOENT', 1009, undefined])
      expect(isStorageUnavailable(Object.assign(new Error('x'), { code }))).toBe(false);
  });
});
