import 'fake-indexeddb/auto';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { closeOutbox, discard, enqueue, flush, pending, revise } from '@/lib/offline/outbox';

/**
 * A server as the field log API behaves: it writes a record once per idempotency key and
 * answers a repeated key with its first answer; it refuses a body without a site name.
 * `cut` makes the network fail after the server has written, before the answer arrives.
 */
function server() {
  const written: { key: string; body: { siteName?: string } }[] = [];
  const answers = new Map<string, { id: number }>();
  let cut = 0;
  let down = false;
  const send = (async (_url: string, init: RequestInit) => {
    if (down) throw new TypeError('Failed to fetch');
    const key = (init.headers as Record<string, string>)['Idempotency-Key']!;
    const body = JSON.parse(String(init.body)) as { siteName?: string };
    if (!body.siteName)
      return Response.json({ error: { message: 'Site name: required.', field: 'siteName' } }, { status: 422 });
    let answer = answers.get(key);
    if (!answer) {
      written.push({ key, body });
      answer = { id: written.length };
      answers.set(key, answer);
    }
    if (cut > 0) {
      cut--;
      throw new TypeError('network connection was lost');
    }
    return Response.json(answer, { status: 201 });
  }) as typeof fetch;
  return {
    send,
    written,
    cutNext: () => void cut++,
    setDown: (d: boolean) => void (down = d),
  };
}

const entry = (siteName: string) => ({
  kind: 'field-log' as const,
  url: '/api/field-log',
  body: { siteName },
  label: siteName,
});

describe('the device outbox', () => {
  beforeEach(() => {
    // a fresh IndexedDB for each case
    indexedDB = new IDBFactory();
    closeOutbox();
  });
  afterEach(closeOutbox);

  it('keeps records while offline and sends each once, in the order made, when back online', async () => {
    const s = server();
    s.setDown(true);
    await enqueue(entry('first'), 1);
    await enqueue(entry('second'), 2);
    const offline = await flush(s.send);
    expect(offline.stopped).toBe(true);
    expect((await pending()).map((r) => [r.label, r.attempts])).toEqual([
      ['first', 1],
      ['second', 0],
    ]);
    s.setDown(false);
    const online = await flush(s.send);
    expect(online.sent.map((x) => x.record.label)).toEqual(['first', 'second']);
    expect(s.written.map((w) => w.body.siteName)).toEqual(['first', 'second']);
    expect(await pending()).toEqual([]);
  });

  it('writes once when the connection drops after the server wrote and the send is retried', async () => {
    const s = server();
    await enqueue(entry('cut off mid-send'));
    s.cutNext();
    const cut = await flush(s.send);
    expect(cut.stopped).toBe(true);
    // the server has it, the phone does not know: it still waits
    expect(s.written).toHaveLength(1);
    expect(await pending()).toHaveLength(1);
    const retry = await flush(s.send);
    expect(retry.sent).toHaveLength(1);
    expect(retry.sent[0]!.response).toEqual({ id: 1 });
    expect(s.written).toHaveLength(1);
  });

  it('keeps a refused record with the server’s reason, goes on with the rest, and resends it fixed under its key', async () => {
    const s = server();
    const bad = await enqueue(entry(''), 1);
    await enqueue(entry('fine'), 2);
    const out = await flush(s.send);
    expect(out.sent.map((x) => x.record.label)).toEqual(['fine']);
    expect(out.refused).toHaveLength(1);
    const [kept] = await pending();
    expect(kept!.state).toBe('refused');
    expect(kept!.error).toEqual({ message: 'Site name: required.', field: 'siteName', status: 422 });
    // a refused record is not sent again until the member changes it
    expect((await flush(s.send)).sent).toEqual([]);
    await revise(bad.id, { siteName: 'fixed' });
    const again = await flush(s.send);
    expect(again.sent.map((x) => x.record.id)).toEqual([bad.id]);
    expect(s.written.map((w) => [w.body.siteName, w.key === bad.id])).toEqual([
      ['fine', false],
      ['fixed', true],
    ]);
  });

  it('lets the member discard a record', async () => {
    const r = await enqueue(entry('not wanted'));
    await discard(r.id);
    expect(await pending()).toEqual([]);
  });
});
