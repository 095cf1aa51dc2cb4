import { execFileSync } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import { mkdirSync, mkdtempSync, readdirSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import sharp from 'sharp';
import { initModels } from '@/models';
import { upload } from '../support/photo-upload';
import { freshDemoDatabase } from '../support/db';

// A switch on the real fs: after `allow` more writes, writeFile fails as a full disk does.
const disk = vi.hoisted(() => ({ allow: Infinity }));
vi.mock('node:fs/promises', async (importOriginal) => {
  const real = await importOriginal<typeof import('node:fs/promises')>();
  const writeFile: typeof real.writeFile = async (...args) => {
    if (disk.allow <= 0)
      throw Object.assign(new Error('ENOSPC: no space left on device, write'), {
        code: 'ENOSPC',
        errno: -28,
        syscall: 'write',
      });
    disk.allow--;
    return real.writeFile(...args);
  };
  return { ...real, writeFile, default: { ...real, writeFile } };
});

const uploadDir = mkdtempSync(path.join(os.tmpdir(), 'clackwater-storage-'));
process.env.UPLOAD_DIR = uploadDir;

/** Every stored photo file under the upload directory (the request temp folder aside). */
function storedFiles(dir = uploadDir): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((d) =>
    d.name === 'tmp' ? [] : d.isDirectory() ? storedFiles(path.join(dir, d.name)) : [path.join(dir, d.name)],
  );
}

/** A 1000 × 750 photo of noise: about 2 MB as PNG, and no copy of it squeezes into 96 kB. */
async function noisyPng(): Promise<Buffer> {
  return sharp(randomBytes(1000 * 750 * 3), { raw: { width: 1000, height: 750, channels: 3 } })
    .png()
    .toBuffer();
}

/** Whether this machine lets the tests mount a small tmpfs (root in most sandboxes; not everywhere). */
function canMount(dir: string): boolean {
  try {
    execFileSync('mount', ['-t', 'tmpfs', '-o', 'size=96k', 'tmpfs', dir], { stdio: 'pipe' });
    return true;
  } catch {
    return false;
  }
}

describe('upload storage full or not writable: a clear 507, no row pointing at a missing file, nothing left behind', () => {
  let png: Buffer;
  beforeAll(async () => {
    await freshDemoDatabase();
    png = await noisyPng();
  });
  afterAll(() => rmSync(uploadDir, { recursive: true, force: true }));

  it('the disk fills between the two copies: both are removed, no row is kept', async () => {
    const rows = await initModels().Photo.count();
    const before = storedFiles();
    disk.allow = 1; // the large copy is written, the thumbnail finds the disk full
    vi.spyOn(console, 'error').mockImplementation(() => {});
    try {
      const res = await upload([{ name: 'weir.png', data: png, type: 'image/png' }]);
      expect(res.status).toBe(507);
      expect((await res.json()).error).toMatchObject({
        code: 'storage_unavailable',
        message: expect.stringMatching(/storage is full or not writable/),
      });
    } finally {
      disk.allow = Infinity;
    }
    expect(await initModels().Photo.count()).toBe(rows);
    expect(storedFiles()).toEqual(before);
    // with room again, the same upload is kept whole: its two copies and its row
    const ok = await upload([{ name: 'weir.png', data: png, type: 'image/png' }]);
    expect(ok.status).toBe(201);
    expect(storedFiles()).toHaveLength(before.length + 2);
    expect(await initModels().Photo.count()).toBe(rows + 1);
  });

  it('a read-only upload directory answers 507 and keeps no row', async () => {
    const rows = await initModels().Photo.count();
    process.env.UPLOAD_DIR = '/sys/clackwater-uploads'; // sysfs refuses mkdir (EPERM as root, EACCES otherwise)
    vi.spyOn(console, 'error').mockImplementation(() => {});
    try {
      const res = await upload([{ name: 'weir.png', data: png, type: 'image/png' }]);
      expect(res.status).toBe(507);
    } finally {
      process.env.UPLOAD_DIR = uploadDir;
    }
    expect(await initModels().Photo.count()).toBe(rows);
  });

  const tiny = path.join(os.tmpdir(), `clackwater-full-${process.pid}`);
  mkdirSync(tiny, { recursive: true });
  const mounted = canMount(tiny);
  it.skipIf(!mounted)(
    'a real filesystem with 96 kB free refuses a 2 MB photo with 507, and is left empty',
    async () => {
      const rows = await initModels().Photo.count();
      process.env.UPLOAD_DIR = tiny;
      vi.spyOn(console, 'error').mockImplementation(() => {});
      try {
        const res = await upload([{ name: 'weir.png', data: png, type: 'image/png' }]);
        expect(await res.json()).toMatchObject({ error: { code: 'storage_unavailable' } });
        expect(res.status).toBe(507);
        expect(await initModels().Photo.count()).toBe(rows);
        expect(storedFiles(tiny)).toEqual([]);
      } finally {
        process.env.UPLOAD_DIR = uploadDir;
        execFileSync('umount', [tiny], { stdio: 'pipe' });
        rmSync(tiny, { recursive: true, force: true });
      }
    },
  );
});
