import { createServer, type IncomingMessage, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';

/**
 * A small stand-in for an S3-compatible server, enough for lib/photos/s3.ts: PutObject
 * (with If-None-Match: * refused when the key exists), GetObject and DeleteObject on
 * path-style URLs (/bucket/key). Signatures are not checked. `failing` makes every
 * request answer 503 SlowDown, as an overloaded or unreachable store would.
 */
export interface FakeS3 {
  url: string;
  objects: Map<string, { body: Buffer; contentType: string }>;
  requests: string[];
  failing: boolean;
  close(): Promise<void>;
}

async function readBody(req: IncomingMessage): Promise<Buffer> {
  const chunks: Buffer[] = [];
  for await (const c of req) chunks.push(c as Buffer);
  return Buffer.concat(chunks);
}

const xmlError = (code: string, message: string) =>
  `<?xml version="1.0" encoding="UTF-8"?><Error><Code>${code}</Code><Message>${message}</Message></Error>`;

export async function startFakeS3(bucket: string): Promise<FakeS3> {
  const state: FakeS3 = { url: '', objects: new Map(), requests: [], failing: false, close: async () => {} };
  const server: Server = createServer(async (req, res) => {
    const url = new URL(req.url ?? '/', 'http://fake');
    state.requests.push(`${req.method} ${url.pathname}`);
    const body = await readBody(req);
    const send = (status: number, payload = '', headers: Record<string, string> = {}) => {
      res.writeHead(status, { 'content-type': 'application/xml', ...headers });
      res.end(payload);
    };
    if (state.failing) return send(503, xmlError('SlowDown', 'Please reduce your request rate.'));
    const [, b, ...rest] = url.pathname.split('/');
    const key = decodeURIComponent(rest.join('/'));
    if (b !== bucket) return send(404, xmlError('NoSuchBucket', 'The specified bucket does not exist.'));
    if (req.method === 'PUT') {
      if (req.headers['if-none-match'] === '*' && state.objects.has(key))
        return send(
          412,
          xmlError('PreconditionFailed', 'At least one of the pre-conditions you specified did not hold'),
        );
      state.objects.set(key, { body, contentType: String(req.headers['content-type'] ?? 'application/octet-stream') });
      return send(200, '', { etag: `"${body.length.toString(16)}"` });
    }
    if (req.method === 'GET') {
      const o = state.objects.get(key);
      if (!o) return send(404, xmlError('NoSuchKey', 'The specified key does not exist.'));
      res.writeHead(200, { 'content-type': o.contentType, 'content-length': String(o.body.length) });
      return res.end(o.body);
    }
    if (req.method === 'DELETE') {
      state.objects.delete(key);
      return send(204);
    }
    return send(501, xmlError('NotImplemented', 'Not in this fake.'));
  });
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  state.url = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  state.close = () => new Promise<void>((resolve) => server.close(() => resolve()));
  return state;
}
