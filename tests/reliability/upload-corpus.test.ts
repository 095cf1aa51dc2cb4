import { mkdtempSync, readdirSync, readFileSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import sharp from 'sharp';
import { initModels } from '@/models';
import { freshDemoDatabase } from '../support/db';
import { upload, type Part } from '../support/photo-upload';

const uploadDir = mkdtempSync(path.join(os.tmpdir(), 'clackwater-corpus-'));
process.env.UPLOAD_DIR = uploadDir;

const stored = () =>
  readdirSync(uploadDir, { recursive: true })
    .map(String)
    .filter((f) => !f.startsWith('tmp') && f !== 'tmp');

/** Each hostile file, what it is and why a photo upload must not keep it as sent. */
let corpus: { what: string; part: Part; status: number; message: RegExp }[] = [];
let png: Buffer;

beforeAll(async () => {
  await freshDemoDatabase();
  png = await sharp({ create: { width: 64, height: 48, channels: 3, background: { r: 31, g: 58, b: 61 } } })
    .png()
    .toBuffer();
  const gif = Buffer.from('R0lGODlhAQABAIAAAAAAAP///yH5BAEAAAAALAAAAAABAAEAAAIBRAA7', 'base64'); // 1×1 GIF89a (W3C GIF89a spec, 1990)
  corpus = [
    // SVG is XML that can carry script (W3C SVG 1.1, 2011, §18): never accepted as a photo
    {
      what: 'SVG with a script',
      part: {
        name: 'drawing.svg',
        type: 'image/svg+xml',
        data: '<svg xmlns="http://www.w3.org/2000/svg"><script>alert(1)</script><rect width="10" height="10"/></svg>',
      },
      status: 415,
      message: /“drawing\.svg” is not a JPEG, PNG or WebP image/,
    },
    {
      what: 'SVG named .png',
      part: {
        name: 'photo.png',
        type: 'image/png',
        data: '<svg xmlns="http://www.w3.org/2000/svg" onload="alert(1)"/>',
      },
      status: 415,
      message: /is not a JPEG, PNG or WebP image/,
    },
    {
      what: 'HTML named .jpg',
      part: { name: 'pump.jpg', type: 'image/jpeg', data: '<!doctype html><script>alert(document.cookie)</script>' },
      status: 415,
      message: /is not a JPEG, PNG or WebP image/,
    },
    {
      what: 'a PDF named .jpeg',
      part: {
        name: 'manual.jpeg',
        type: 'image/jpeg',
        data: '%PDF-1.4\n1 0 obj<</Type/Catalog>>endobj\ntrailer<</Root 1 0 R>>\n%%EOF',
      },
      status: 415,
      message: /is not a JPEG, PNG or WebP image/,
    },
    {
      what: 'a ZIP named .png (the start of a JAR/GIFAR-style polyglot)',
      part: { name: 'x.png', data: Buffer.concat([Buffer.from('PK\u0003\u0004'), Buffer.alloc(200)]) },
      status: 415,
      message: /is not a JPEG, PNG or WebP image/,
    },
    {
      what: 'a shell script named .webp',
      part: { name: 'run.webp', type: 'image/webp', data: '#!/bin/sh\nrm -rf /\n' },
      status: 415,
      message: /is not a JPEG, PNG or WebP image/,
    },
    {
      what: 'zero bytes',
      part: { name: 'empty.png', type: 'image/png', data: Buffer.alloc(0) },
      status: 400,
      message: /empty/i,
    },
    {
      what: 'a truncated PNG (signature and half a header)',
      part: { name: 'cut.png', type: 'image/png', data: png.subarray(0, 20) },
      status: 415,
      message: /“cut\.png” could not be read as an image/,
    },
    {
      what: 'a GIF (not one of the accepted kinds) with HTML after it',
      part: {
        name: 'anim.gif',
        type: 'image/gif',
        data: Buffer.concat([gif, Buffer.from('<script>alert(1)</script>')]),
      },
      status: 415,
      message: /is not a JPEG, PNG or WebP image/,
    },
  ];
});
afterAll(() => rmSync(uploadDir, { recursive: true, force: true }));

describe('the upload corpus: hostile files are refused with a message and nothing is kept (real MariaDB)', () => {
  it('refuses each file, naming it, and writes no file and no row', async () => {
    const { Photo } = initModels();
    const before = stored();
    for (const [i, c] of corpus.entries()) {
      const rows = await Photo.count();
      const res = await upload([c.part], { ip: `10.9.1.${i + 1}` });
      const body = await res.json();
      expect(res.status, c.what).toBe(c.status);
      expect(body.error.field, c.what).toBe('photos');
      expect(body.error.message, c.what).toMatch(c.message);
      expect(body.error.message, c.what).not.toMatch(/at .*\.(ts|js):\d+|stack/i);
      expect(await Photo.count(), c.what).toBe(rows);
      expect(stored(), c.what).toEqual(before);
      expect(readdirSync(path.join(uploadDir, 'tmp')), c.what).toEqual([]);
    }
  });

  it('a real photo carrying script after its image data is kept only as our re-encoded copy, without the script', async () => {
    const polyglot = Buffer.concat([png, Buffer.from('<script>alert("XSS")</script><?php system($_GET["c"]); ?>')]);
    const before = new Set(stored());
    const res = await upload([{ name: 'polyglot.png.html', type: 'text/html', data: polyglot }], { ip: '10.9.2.1' });
    expect(res.status).toBe(201);
    const files = stored().filter((f) => !before.has(f));
    expect(files.length).toBeGreaterThan(0);
    for (const f of files) {
      const bytes = readFileSync(path.join(uploadDir, f));
      expect(bytes.includes('<script>'), f).toBe(false);
      expect(bytes.includes('<?php'), f).toBe(false);
      expect(bytes.subarray(8, 12).toString('ascii'), f).toBe('WEBP'); // RIFF....WEBP (Google, WebP container specification, 2023)
      expect(f, 'stored under our own id, never the sent name').not.toMatch(/polyglot|\.html/);
    }
  });

  it('path-traversal and odd names never choose where a file lands', async () => {
    for (const [i, name] of [
      '../../../../etc/passwd.png',
      '..\\..\\windows\\win.ini.png',
      '%2e%2e%2f%2e%2e%2fetc%2fhosts.png',
      'photo.png\u0000.exe',
      'CON.png',
      `${'a'.repeat(300)}.png`,
    ].entries()) {
      const res = await upload([{ name, type: 'image/png', data: png }], { ip: `10.9.3.${i + 1}` });
      expect([201, 400], name).toContain(res.status);
    }
    for (const f of stored()) expect(f).toMatch(/^[A-Za-z0-9_-]+(-thumb)?\.webp$/);
    expect(readdirSync(path.dirname(uploadDir)).some((f) => /passwd|hosts|win\.ini/.test(f))).toBe(false);
  });
});
