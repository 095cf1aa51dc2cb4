import { createServer, type IncomingMessage, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { getJson, getJsonOrNull, RequestError, sendJson, UNREACHABLE } from '@/lib/http/client';

/* The browser's JSON client against a real HTTP server on loopback that echoes what it received. */
let server: Server;
let base = '';
const seen: { method?: string; contentType?: string; body: string }[] = [];

async function read(req: IncomingMessage) {
  let body = '';
  for await (const chunk of req) body += chunk;
  return body;
}

beforeAll(async () => {
  server = createServer(async (req, res) => {
    const body = await read(req);
    seen.push({ method: req.method, contentType: req.headers['content-type'], body });
    res.setHeader('content-type', 'application/json');
    if (req.url === '/refused') {
      res.statusCode = 400;
      res.end(JSON.stringify({ error: { field: 'title', message: 'title must be at least 10 characters' } }));
    } else if (req.url === '/broken') {
      res.statusCode = 500;
      res.end('<html>not json</html>');
    } else {
      res.end(JSON.stringify({ echoed: body ? JSON.parse(body) : null }));
    }
  });
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
});
afterAll(() => new Promise<void>((resolve) => server.close(() => resolve())));

describe('sendJson', () => {
  it('sends a body as JSON with its Content-Type and returns the answer', async () => {
    const r = await sendJson<{ echoed: unknown }>(`${base}/ok`, 'POST', { title: 'Ram stops after a minute' });
    expect(r).toEqual({ ok: true, status: 200, data: { echoed: { title: 'Ram stops after a minute' } } });
    expect(seen.at(-1)).toMatchObject({ method: 'POST', contentType: 'application/json' });
  });

  it('sends no Content-Type when there is no body', async () => {
    await sendJson(`${base}/ok`, 'DELETE');
    expect(seen.at(-1)).toMatchObject({ method: 'DELETE', contentType: undefined, body: '' });
  });

  it("hands back the API's field and message on a refusal, and the whole answer", async () => {
    const r = await sendJson(`${base}/refused`, 'PUT', { title: 'short' });
    expect(r).toMatchObject({
      ok: false,
      status: 400,
      error: { field: 'title', message: 'title must be at least 10 characters' },
    });
  });

  it('says what happened when the answer is not JSON, and when the server cannot be reached', async () => {
    expect(await sendJson(`${base}/broken`, 'POST', {})).toMatchObject({
      ok: false,
      status: 500,
      error: { message: 'Something went wrong (500).' },
    });
    const closed = createServer();
    await new Promise<void>((resolve) => closed.listen(0, '127.0.0.1', resolve));
    const port = (closed.address() as AddressInfo).port;
    await new Promise<void>((resolve) => closed.close(() => resolve()));
    expect(await sendJson(`http://127.0.0.1:${port}/`, 'POST', {})).toMatchObject({
      ok: false,
      status: 0,
      error: { message: UNREACHABLE },
    });
  });
});

describe('SWR fetchers', () => {
  it('getJson returns the data or throws the API message', async () => {
    expect(await getJson(`${base}/ok`)).toEqual({ echoed: null });
    await expect(getJson(`${base}/refused`)).rejects.toEqual(
      new RequestError(400, 'title must be at least 10 characters'),
    );
  });

  it('getJsonOrNull answers null on a refusal', async () => {
    expect(await getJsonOrNull(`${base}/refused`)).toBeNull();
  });
});
