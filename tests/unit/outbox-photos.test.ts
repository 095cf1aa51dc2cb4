import 'fake-indexeddb/auto';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { closeOutbox, enqueue, flush, pending, revise } from '@/lib/offline/outbox';
import { KEPT_PHOTO_LIMITS, keepRefusal, keptBytes, withPhotoIds, type KeptPhoto } from '@/lib/offline/photos';

const MB = 1024 * 1024;

/**
 * A server as POST /api/photos and POST /api/field-log behave: each writes once per
 * idempotency key and answers a repeated key with its first answer; the photo API refuses
 * what is not an image, the field log a body without a site name. `cut(url)` makes the
 * network fail after the server has written that request, before the answer arrives.
 */
function server() {
  const photos: { key: string; id: string; bytes: string }[] = [];
  const entries: { key: string; body: { siteName?: string; photoIds?: string[] } }[] = [];
  const cuts: string[] = [];
  let down = false;
  let expired = false;
  const send = (async (url: string, init: RequestInit) => {
    if (down) throw new TypeError('Failed to fetch');
    if (expired) return Response.json({ error: { message: 'Sign in to do that.' } }, { status: 401 });
    const key = (init.headers as Record<string, string>)['Idempotency-Key']!;
    let answer: unknown;
    if (url === '/api/photos') {
      const file = (init.body as FormData).get('photos') as File;
      const bytes = await file.text();
      if (!bytes.startsWith('JPEG'))
        return Response.json(
          { error: { message: `“${file.name}” is not a JPEG, PNG or WebP image.`, field: 'photos' } },
          { status: 415 },
        );
      let p = photos.find((x) => x.key === key);
      if (!p) photos.push((p = { key, id: `photo${photos.length + 1}`.padEnd(16, 'x'), bytes }));
      answer = { photos: [{ id: p.id }] };
    } else {
      const body = JSON.parse(String(init.body)) as { siteName?: string; photoIds?: string[] };
      if (!body.siteName)
        return Response.json({ error: { message: 'Site name: required.', field: 'siteName' } }, { status: 422 });
      let e = entries.findIndex((x) => x.key === key);
      if (e < 0) e = entries.push({ key, body }) - 1;
      answer = { id: e + 1, url: `/field-log/${e + 1}` };
    }
    const cut = cuts.indexOf(url);
    if (cut >= 0) {
      cuts.splice(cut, 1);
      throw new TypeError('network connection was lost');
    }
    return Response.json(answer, { status: 201 });
  }) as typeof fetch;
  return {
    send,
    photos,
    entries,
    cut: (url: string) => void cuts.push(url),
    setDown: (d: boolean) => void (down = d),
    setExpired: (e: boolean) => void (expired = e),
  };
}

const photo = (name: string, bytes = 'JPEG…', key = crypto.randomUUID()): KeptPhoto => ({
  key,
  name,
  blob: new Blob([bytes], { type: 'image/jpeg' }),
});
const entry = (siteName: string, photos: KeptPhoto[]) => ({
  kind: 'field-log' as const,
  url: '/api/field-log',
  body: { siteName, photoIds: [] },
  label: siteName,
  photos,
});

describe('keeping photos on the phone', () => {
  const file = (name: string, size: number, type = 'image/jpeg') => ({ name, size, type });

  it('keeps up to three a test, each within the server’s 8 MB, all within 40 MB on the phone', () => {
    // the bounds chosen in lib/offline/photos.ts (one photo: the server's own limit, lib/photos/limits.ts)
    expect(KEPT_PHOTO_LIMITS).toEqual({ perRecord: 3, maxFileBytes: 8 * MB, maxDeviceBytes: 40 * MB });
    expect(keepRefusal([file('a.jpg', 3 * MB)], 0, 0)).toBeNull();
    expect(keepRefusal([file('a.jpg', 8 * MB)], 2, 31 * MB)).toBeNull();
    expect(keepRefusal([file('a.jpg', 8 * MB + 1)], 0, 0)).toBe(
      '“a.jpg” is larger than 8 MB, the limit for one photo.',
    );
    expect(keepRefusal([file('a.jpg', 1), file('b.jpg', 1)], 2, 0)).toBe('You can add 1 more photo (3 at most).');
    expect(keepRefusal([file('a.jpg', 1)], 3, 0)).toBe('A test keeps 3 photos at most.');
    expect(keepRefusal([file('notes.pdf', 1, 'application/pdf')], 0, 0)).toBe(
      '“notes.pdf” is not a JPEG, PNG or WebP photo.',
    );
    expect(keepRefusal([file('a.jpg', 6 * MB)], 0, 35 * MB)).toMatch(
      /^This phone already keeps 35 MB of photos waiting to send; 40 MB is the most it keeps\./,
    );
  });

  it('names the uploaded photos in the record as sent, beside any it named already', () => {
    const p = [{ ...photo('a.jpg'), uploadedId: 'AAAAAAAAAAAAAAAA' }, photo('b.jpg')];
    expect(withPhotoIds({ siteName: 'x', photoIds: ['BBBBBBBBBBBBBBBB'] }, p)).toEqual({
      siteName: 'x',
      photoIds: ['BBBBBBBBBBBBBBBB', 'AAAAAAAAAAAAAAAA'],
    });
    expect(withPhotoIds({ siteName: 'x' }, undefined)).toEqual({ siteName: 'x' });
    // bytes, not characters: “…” is three bytes in UTF-8 (Unicode Standard, ch. 3)
    expect(keptBytes([{ photos: p }, {}])).toBe(2 * new TextEncoder().encode('JPEG…').length);
  });
});

describe('the outbox with photos', () => {
  beforeEach(() => {
    indexedDB = new IDBFactory();
    closeOutbox();
  });
  afterEach(closeOutbox);

  it('keeps the photo’s file with the record offline, then uploads it and sends the entry naming it', async () => {
    const s = server();
    s.setDown(true);
    await enqueue(entry('Hollin spring', [photo('ram-house.jpg', 'JPEG ram house')]));
    expect((await flush(s.send)).stopped).toBe(true);
    const [kept] = await pending();
    expect(await kept!.photos![0]!.blob.text()).toBe('JPEG ram house');
    s.setDown(false);
    const out = await flush(s.send);
    expect(out.sent).toHaveLength(1);
    expect(s.photos.map((p) => p.bytes)).toEqual(['JPEG ram house']);
    expect(s.entries.map((e) => e.body.photoIds)).toEqual([[s.photos[0]!.id]]);
    expect(await pending()).toEqual([]);
  });

  it('an upload cut off after the server stored it, and sent again, is one photo; so is a cut-off entry', async () => {
    const s = server();
    const p = photo('intake.jpg');
    await enqueue(entry('Hollin spring', [p]));
    s.cut('/api/photos');
    expect((await flush(s.send)).stopped).toBe(true);
    expect(s.photos).toHaveLength(1);
    s.cut('/api/field-log');
    expect((await flush(s.send)).stopped).toBe(true);
    expect(s.entries).toHaveLength(1);
    // the photo's id was kept once it landed: the next send does not upload it again
    const [waiting] = await pending();
    expect(waiting!.photos![0]!.uploadedId).toBe(s.photos[0]!.id);
    const out = await flush(s.send);
    expect(out.sent[0]!.response).toEqual({ id: 1, url: '/field-log/1' });
    expect([s.photos.length, s.entries.length]).toEqual([1, 1]);
    expect(s.photos[0]!.key).toBe(p.key);
  });

  it('a photo the server refuses keeps the record, the photo and the reason; the next record still goes', async () => {
    const s = server();
    await enqueue(entry('with a bad photo', [photo('ok.jpg'), photo('scan.jpg', 'PDF…')]), 1);
    await enqueue(entry('plain', []), 2);
    const out = await flush(s.send);
    expect(out.sent.map((x) => x.record.label)).toEqual(['plain']);
    const [kept] = await pending();
    expect(kept!.state).toBe('refused');
    expect(kept!.error).toEqual({
      message: 'The photo “scan.jpg” was not accepted: “scan.jpg” is not a JPEG, PNG or WebP image.',
      field: 'photos',
      status: 415,
    });
    expect(kept!.photos!.map((p) => [p.name, Boolean(p.uploadedId)])).toEqual([
      ['ok.jpg', true],
      ['scan.jpg', false],
    ]);
  });

  it('an entry refused keeps its photo; put right, it is sent naming the photo uploaded the first time', async () => {
    const s = server();
    const r = await enqueue(entry('', [photo('outlet.jpg')]));
    await flush(s.send);
    const [kept] = await pending();
    expect(kept!.state).toBe('refused');
    expect(await kept!.photos![0]!.blob.text()).toBe('JPEG…');
    await revise(r.id, { siteName: 'put right', photoIds: [] });
    const out = await flush(s.send);
    expect(out.sent).toHaveLength(1);
    expect(s.photos).toHaveLength(1);
    expect(s.entries.map((e) => [e.body.siteName, e.body.photoIds])).toEqual([['put right', [s.photos[0]!.id]]]);
  });

  it('sent after the session ended, it is refused with the reason and kept; after signing in it goes', async () => {
    const s = server();
    const r = await enqueue(entry('late', [photo('late.jpg')]));
    s.setExpired(true);
    await flush(s.send);
    const [kept] = await pending();
    expect([kept!.state, kept!.error?.status]).toEqual(['refused', 401]);
    s.setExpired(false);
    await revise(r.id, kept!.body);
    expect((await flush(s.send)).sent).toHaveLength(1);
    expect([s.photos.length, s.entries.length]).toEqual([1, 1]);
  });
});
