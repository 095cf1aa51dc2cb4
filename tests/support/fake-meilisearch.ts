import { createServer, type IncomingMessage, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';

/**
 * A small stand-in for a Meilisearch server, enough for lib/search/meili-engine.ts:
 * create an index, settings, add and delete documents, stats, search with filters,
 * and task status. Tasks finish at once. Ranking follows Meilisearch's documented
 * default rules as far as our documents need them: "words" (how many query words a
 * document holds), then "attribute" (matches in the first searchable attribute
 * first), then "proximity" approximated by the earliest match, then insertion order.
 */
type Doc = Record<string, unknown> & { id: string };

interface FakeIndex {
  primaryKey: string;
  settings: Record<string, unknown>;
  docs: Map<string, Doc>;
}

export interface FakeMeili {
  url: string;
  requests: string[];
  indexes: Map<string, FakeIndex>;
  close(): Promise<void>;
}

async function readBody(req: IncomingMessage): Promise<unknown> {
  const chunks: Buffer[] = [];
  for await (const c of req) chunks.push(c as Buffer);
  const text = Buffer.concat(chunks).toString('utf8');
  return text ? JSON.parse(text) : undefined;
}

function matchesFilter(doc: Doc, expr: string): boolean {
  let m = /^(\w+)\s*=\s*(.+)$/.exec(expr.trim());
  if (m) {
    const value = JSON.parse(m[2]);
    const field = doc[m[1]];
    return Array.isArray(field) ? field.includes(value) : field === value;
  }
  m = /^(\w+)\s+IN\s+(\[.*\])$/.exec(expr.trim());
  if (m) return (JSON.parse(m[2]) as unknown[]).includes(doc[m[1]]);
  throw new Error(`fake Meilisearch: filter not understood: ${expr}`);
}

export async function startFakeMeilisearch(): Promise<FakeMeili> {
  const indexes = new Map<string, FakeIndex>();
  const tasks = new Map<number, Record<string, unknown>>();
  const requests: string[] = [];
  let taskUid = 0;
  const task = (indexUid: string, type: string, error?: string) => {
    const uid = ++taskUid;
    tasks.set(uid, {
      uid,
      indexUid,
      type,
      status: error ? 'failed' : 'succeeded',
      error: error ? { message: error, code: 'fake_error' } : null,
    });
    return { taskUid: uid, indexUid, status: 'enqueued', type, enqueuedAt: new Date().toISOString() };
  };

  const server: Server = createServer(async (req, res) => {
    const url = new URL(req.url ?? '/', 'http://fake');
    requests.push(`${req.method} ${url.pathname}`);
    const send = (status: number, body: unknown) => {
      res.writeHead(status, { 'content-type': 'application/json' });
      res.end(JSON.stringify(body));
    };
    try {
      const body = await readBody(req);
      const parts = url.pathname.split('/').filter(Boolean);
      if (parts[0] === 'tasks' && parts[1] && req.method === 'GET') {
        const t = tasks.get(Number(parts[1]));
        return t ? send(200, t) : send(404, { message: 'task not found', code: 'task_not_found' });
      }
      if (parts[0] !== 'indexes') return send(404, { message: `no route ${url.pathname}`, code: 'not_found' });
      if (parts.length === 1 && req.method === 'POST') {
        const { uid, primaryKey } = body as { uid: string; primaryKey: string };
        if (indexes.has(uid)) return send(202, task(uid, 'indexCreation', `Index \`${uid}\` already exists.`));
        indexes.set(uid, { primaryKey, settings: {}, docs: new Map() });
        return send(202, task(uid, 'indexCreation'));
      }
      const idx = indexes.get(parts[1]);
      if (!idx) return send(404, { message: `Index \`${parts[1]}\` not found.`, code: 'index_not_found' });
      const rest = parts.slice(2).join('/');
      if (rest === 'settings' && req.method === 'PATCH') {
        Object.assign(idx.settings, body);
        return send(202, task(parts[1], 'settingsUpdate'));
      }
      if (rest === 'stats' && req.method === 'GET')
        return send(200, { numberOfDocuments: idx.docs.size, isIndexing: false, fieldDistribution: {} });
      if (rest === 'documents' && req.method === 'POST') {
        for (const d of body as Doc[]) idx.docs.set(String(d[idx.primaryKey]), d);
        return send(202, task(parts[1], 'documentAdditionOrUpdate'));
      }
      if (rest === 'documents' && req.method === 'DELETE') {
        idx.docs.clear();
        return send(202, task(parts[1], 'documentDeletion'));
      }
      if (rest === 'documents/delete-batch' && req.method === 'POST') {
        for (const id of body as string[]) idx.docs.delete(String(id));
        return send(202, task(parts[1], 'documentDeletion'));
      }
      if (rest === 'search' && req.method === 'POST') {
        const {
          q = '',
          filter = [],
          limit = 20,
          offset = 0,
          attributesToRetrieve,
        } = body as { q?: string; filter?: string[]; limit?: number; offset?: number; attributesToRetrieve?: string[] };
        const words = [...new Set(q.split(/\s+/).filter(Boolean))];
        const attrs = (idx.settings.searchableAttributes as string[]) ?? ['*'];
        const scored: { doc: Doc; words: number; attribute: number; proximity: number; order: number }[] = [];
        let order = 0;
        for (const doc of idx.docs.values()) {
          order++;
          if (!filter.every((f) => matchesFilter(doc, f))) continue;
          const fields = attrs.map((a) => String(doc[a] ?? '').split(' '));
          let w = 0;
          let attribute = 0;
          let proximity = 0;
          for (const word of words) {
            const inHead = fields[0]?.includes(word);
            const pos = fields.slice(1).flat().indexOf(word);
            if (inHead || pos >= 0) w++;
            if (inHead) attribute++;
            if (pos >= 0) proximity += pos;
          }
          if (w > 0) scored.push({ doc, words: w, attribute, proximity, order });
        }
        scored.sort(
          (a, b) => b.words - a.words || b.attribute - a.attribute || a.proximity - b.proximity || a.order - b.order,
        );
        const pick = (d: Doc) =>
          attributesToRetrieve ? Object.fromEntries(attributesToRetrieve.map((k) => [k, d[k]])) : d;
        return send(200, {
          hits: scored.slice(offset, offset + limit).map((s) => pick(s.doc)),
          query: q,
          offset,
          limit,
          estimatedTotalHits: scored.length,
          processingTimeMs: 0,
        });
      }
      return send(404, { message: `no route ${req.method} ${url.pathname}`, code: 'not_found' });
    } catch (err) {
      return send(400, { message: (err as Error).message, code: 'bad_request' });
    }
  });
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  const { port } = server.address() as AddressInfo;
  return {
    url: `http://127.0.0.1:${port}`,
    requests,
    indexes,
    close: () => new Promise((resolve) => server.close(() => resolve())),
  };
}
