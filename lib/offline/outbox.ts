/**
 * The device's outbox: records made at the water with no signal (a field log entry, a
 * site's survey) wait here, in IndexedDB, until the phone is back online. Each record
 * carries its own idempotency key from the moment it is made, so a send that is cut off
 * after the server wrote it and then retried is still written once. A record the server
 * refuses stays, with the server's reason, for the member to fix; nothing is dropped.
 * Browser code with no framework in it, so a page, a service worker or a test can use it.
 */
import { openDB, type DBSchema, type IDBPDatabase } from 'idb';
import { refusedForGood, sendKeptPhotos, withPhotoIds, type KeptPhoto } from './photos';

export type OutboxKind = 'field-log' | 'site' | 'site-version' | 'question';

export interface OutboxRecord {
  /** the idempotency key too: one per record, made on the device */
  id: string;
  kind: OutboxKind;
  /** where it is sent (same origin) */
  url: string;
  body: unknown;
  /** a line for the list: "Field log: Hollin spring, 2 June" */
  label: string;
  createdAt: number;
  state: 'waiting' | 'refused';
  attempts: number;
  /** where the member puts a refused record right (the form it came from), if not made again from scratch */
  fixAt?: string;
  /** the server's reason, for a refused record */
  error?: { message: string; field?: string; status: number };
  /** photos kept with it, uploaded before it is sent (lib/offline/photos.ts) */
  photos?: KeptPhoto[];
}

interface OutboxDb extends DBSchema {
  records: { key: string; value: OutboxRecord; indexes: { createdAt: number } };
}

const DB_NAME = 'clackwater-outbox';
let opened: Promise<IDBPDatabase<OutboxDb>> | null = null;

function db(): Promise<IDBPDatabase<OutboxDb>> {
  opened ??= openDB<OutboxDb>(DB_NAME, 1, {
    upgrade(d) {
      d.createObjectStore('records', { keyPath: 'id' }).createIndex('createdAt', 'createdAt');
    },
  });
  return opened;
}

/** Forgets the open connection (tests start each case on a fresh database). */
export function closeOutbox() {
  void opened?.then((d) => d.close());
  opened = null;
}

/**
 * Puts a record in the outbox; it is sent by the next {@link flush}. A form that already
 * tried to send it passes the key it tried with, so a send that reached the server before
 * the signal went is not written twice.
 */
export async function enqueue(
  record: Pick<OutboxRecord, 'kind' | 'url' | 'body' | 'label' | 'photos' | 'fixAt'> & { id?: string },
  now = Date.now(),
): Promise<OutboxRecord> {
  const full: OutboxRecord = {
    ...record,
    id: record.id ?? crypto.randomUUID(),
    createdAt: now,
    state: 'waiting',
    attempts: 0,
  };
  await (await db()).put('records', full);
  return full;
}

/** Everything still on the device, oldest first. */
export async function pending(): Promise<OutboxRecord[]> {
  return (await db()).getAllFromIndex('records', 'createdAt');
}

/** One record, if it is still on the device. */
export async function outboxRecord(id: string): Promise<OutboxRecord | undefined> {
  return (await db()).get('records', id);
}

/** The member changed a refused record: it waits to be sent again, under the same key. */
export async function revise(id: string, body: unknown): Promise<void> {
  const d = await db();
  const r = await d.get('records', id);
  if (!r) return;
  await d.put('records', { ...r, body, state: 'waiting', error: undefined });
}

/** The member gives up on a record. */
export async function discard(id: string): Promise<void> {
  await (await db()).delete('records', id);
}

export interface FlushResult {
  sent: { record: OutboxRecord; response: unknown }[];
  refused: OutboxRecord[];
  /** true when the network or the server failed and the rest wait for the next try */
  stopped: boolean;
}

/**
 * Sends what waits, oldest first, each with its key. A 2xx takes the record out; a 4xx
 * (other than 408 and 429, which mean "later") marks it refused with the server's reason
 * and goes on to the next; a network failure or a 5xx stops, leaving it and the rest to
 * wait. Two flushes at once (two tabs, an `online` event during a tap on "send now")
 * cannot send a record twice over, because the server answers a repeated key with the
 * first answer.
 */
export async function flush(send: typeof fetch = fetch): Promise<FlushResult> {
  const out: FlushResult = { sent: [], refused: [], stopped: false };
  const d = await db();
  for (let record of await pending()) {
    if (record.state !== 'waiting') continue;
    if (record.photos?.some((p) => !p.uploadedId)) {
      // the photos first, each id kept as it lands; the record then names them
      const up = await sendKeptPhotos(record.photos, send, (photos) => d.put('records', { ...record, photos }).then());
      record = { ...record, photos: up.photos };
      if (up.outcome === 'refused') {
        const refused: OutboxRecord = { ...record, attempts: record.attempts + 1, state: 'refused', error: up.error };
        await d.put('records', refused);
        out.refused.push(refused);
        continue;
      }
      if (up.outcome === 'stopped') {
        await d.put('records', { ...record, attempts: record.attempts + 1 });
        out.stopped = true;
        break;
      }
    }
    let res: Response;
    try {
      res = await send(record.url, {
        method: 'POST',
        headers: { 'content-type': 'application/json', 'Idempotency-Key': record.id },
        body: JSON.stringify(withPhotoIds(record.body, record.photos)),
        credentials: 'same-origin',
      });
    } catch {
      await d.put('records', { ...record, attempts: record.attempts + 1 });
      out.stopped = true;
      break;
    }
    const body: unknown = await res.json().catch(() => null);
    if (res.ok) {
      await d.delete('records', record.id);
      out.sent.push({ record, response: body });
    } else if (refusedForGood(res.status)) {
      const e = (body as { error?: { message?: string; field?: string } } | null)?.error;
      const refused: OutboxRecord = {
        ...record,
        attempts: record.attempts + 1,
        state: 'refused',
        error: { message: e?.message ?? `Refused (${res.status}).`, field: e?.field, status: res.status },
      };
      await d.put('records', refused);
      out.refused.push(refused);
    } else {
      await d.put('records', { ...record, attempts: record.attempts + 1 });
      out.stopped = true;
      break;
    }
  }
  return out;
}
