import { readFileSync } from 'node:fs';
import path from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { NextRequest } from 'next/server';
import { POST as helpful } from '@/app/api/helpful/route';
import { POST as follow } from '@/app/api/questions/[id]/follow/route';
import { POST as ask } from '@/app/api/questions/route';
import { POST as saveCalculation } from '@/app/api/calculations/route';
import { POST as apply } from '@/app/api/expert-applications/route';
import { POST as createEntry } from '@/app/api/field-log/route';
import { POST as importRoute } from '@/app/api/field-log/import/route';
import { POST as signUp } from '@/app/api/account/sign-up/route';
import { initModels } from '@/models';
import { siteUrl } from '@/lib/site';
import { JSON_BODY_LIMIT } from '@/lib/http/request-checks';
import { actAs, sessionCookie, type Handler } from '../support/act-as';
import { freshDemoDatabase } from '../support/db';

const { call } = actAs('10.61');
const SITE = new URL(siteUrl()).origin;
/** A page on the same host but another port: same site, another origin (the attack in issue 17). */
const SAME_SITE_OTHER_PORT = 'http://127.0.0.1:9999';

async function send(
  handler: Handler,
  url: string,
  init: { method?: string; headers?: Record<string, string>; body?: BodyInit },
  who: string | null,
  params: Record<string, string> = {},
) {
  const headers: Record<string, string> = {
    'x-forwarded-for': `10.62.0.${Math.floor(Math.random() * 250) + 1}`,
    ...(init.headers ?? {}),
  };
  if (who) headers.cookie = await sessionCookie(who);
  const req = new NextRequest(`http://localhost${url}`, {
    method: init.method ?? 'POST',
    headers,
    body: init.body,
    duplex: 'half',
  } as ConstructorParameters<typeof NextRequest>[1]);
  const res = await handler(req, { params: Promise.resolve(params) });
  const text = await res.text();
  return { status: res.status, body: text ? JSON.parse(text) : null };
}

let questionId = 0;
const helpfulCount = () => initModels().HelpfulMark.count();

describe('cross-site writes (issue 17, item 8)', () => {
  beforeAll(async () => {
    await freshDemoDatabase();
    const { Question, User } = initModels();
    const other = (await User.findOne({ where: { handle: 'ferncombe_tamsin' } }))!.id;
    questionId = (await Question.findOne({
      where: { authorId: other, hiddenAt: null, deletedAt: null },
      order: [['id', 'ASC']],
    }))!.id;
  });

  it('refuses a text/plain form body with 415, whatever it holds, and saves no mark', async () => {
    const before = await helpfulCount();
    // what <form enctype="text/plain"> sends: name=value, here shaped to parse as JSON
    const body = `{"postType":"question","postId":${questionId},"x":"=1"}`;
    const res = await send(
      helpful,
      '/api/helpful',
      { headers: { 'content-type': 'text/plain' }, body },
      'highcrag_shepherd',
    );
    expect(res.status).toBe(415);
    const noType = await send(helpful, '/api/helpful', { body }, 'highcrag_shepherd');
    expect(noType.status).toBe(415);
    expect(await helpfulCount()).toBe(before);
  });

  it('refuses JSON writes from another origin or a same-site page, with 403', async () => {
    const body = JSON.stringify({ postType: 'question', postId: questionId });
    const json = { 'content-type': 'application/json' };
    const before = await helpfulCount();
    expect(
      (
        await send(
          helpful,
          '/api/helpful',
          { headers: { ...json, origin: SAME_SITE_OTHER_PORT }, body },
          'highcrag_shepherd',
        )
      ).status,
    ).toBe(403);
    expect(
      (await send(helpful, '/api/helpful', { headers: { ...json, origin: 'null' }, body }, 'highcrag_shepherd')).status,
    ).toBe(403);
    expect(
      (
        await send(
          helpful,
          '/api/helpful',
          { headers: { ...json, 'sec-fetch-site': 'same-site' }, body },
          'highcrag_shepherd',
        )
      ).status,
    ).toBe(403);
    expect(
      (
        await send(
          helpful,
          '/api/helpful',
          { headers: { ...json, 'sec-fetch-site': 'cross-site' }, body },
          'highcrag_shepherd',
        )
      ).status,
    ).toBe(403);
    expect(await helpfulCount()).toBe(before);
    // a body-less write goes through guarded() and is refused the same way
    const followed = await send(
      follow,
      `/api/questions/${questionId}/follow`,
      { headers: { origin: SAME_SITE_OTHER_PORT } },
      'highcrag_shepherd',
      { id: String(questionId) },
    );
    expect(followed.status).toBe(403);
    expect(followed.body.error.code).toBe('cross_site');
    // public JSON routes too
    const signed = await send(
      signUp,
      '/api/account/sign-up',
      { headers: { ...json, origin: SAME_SITE_OTHER_PORT }, body: JSON.stringify({}) },
      null,
    );
    expect(signed.status).toBe(403);
  });

  it("accepts the site's own pages: its Origin, or Sec-Fetch-Site same-origin", async () => {
    const body = JSON.stringify({ postType: 'question', postId: questionId });
    const json = { 'content-type': 'application/json; charset=utf-8' };
    const res = await send(helpful, '/api/helpful', { headers: { ...json, origin: SITE }, body }, 'highcrag_shepherd');
    expect(res.status).toBe(201);
    const again = await send(
      helpful,
      '/api/helpful',
      { headers: { ...json, 'sec-fetch-site': 'same-origin' }, body },
      'sorrel_cabin',
    );
    expect(again.status).toBe(201);
    // the Host the request was sent to counts as the site's own (a dev server reached as localhost)
    const host = await send(
      follow,
      `/api/questions/${questionId}/follow`,
      { headers: { origin: 'http://localhost:3000', host: 'localhost:3000' } },
      'highcrag_shepherd',
      { id: String(questionId) },
    );
    expect(host.status).toBeLessThan(300);
  });
});

describe('request body size (issue 17, item 14)', () => {
  /** A body stream that counts how many bytes were pulled from it. */
  function countingBody(totalBytes: number, chunk = 64 * 1024) {
    const state = { pulled: 0 };
    const piece = new Uint8Array(chunk).fill(0x20);
    const stream = new ReadableStream<Uint8Array>({
      pull(controller) {
        if (state.pulled >= totalBytes) return controller.close();
        state.pulled += chunk;
        controller.enqueue(piece);
      },
    });
    return { stream, state };
  }

  it('refuses a declared 50 MB body with 413 without reading any of it', async () => {
    const { stream, state } = countingBody(50 * 1024 * 1024);
    const res = await send(
      signUp,
      '/api/account/sign-up',
      { headers: { 'content-type': 'application/json', 'content-length': String(50 * 1024 * 1024) }, body: stream },
      null,
    );
    expect(res.status).toBe(413);
    expect(res.body.error.code).toBe('body_too_large');
    // a ReadableStream may pull once ahead of the reader (its high-water mark); never more
    expect(state.pulled).toBeLessThanOrEqual(64 * 1024);
  });

  it('stops reading a chunked body as soon as it passes the limit', async () => {
    const { stream, state } = countingBody(50 * 1024 * 1024);
    const res = await send(
      signUp,
      '/api/account/sign-up',
      { headers: { 'content-type': 'application/json' }, body: stream },
      null,
    );
    expect(res.status).toBe(413);
    // the limit plus at most two chunks in flight, not 50 MB
    expect(state.pulled).toBeLessThanOrEqual(JSON_BODY_LIMIT + 2 * 64 * 1024);
  });

  it('still takes a body just under the limit (the CSV import has its own, larger one)', async () => {
    const csv = `${'x'.repeat(JSON_BODY_LIMIT + 10_000)}`;
    const res = await call(importRoute, 'POST', '/api/field-log/import', 'sorrel_cabin', { csv });
    expect(res.status).not.toBe(413);
    expect(res.status).toBeLessThan(500);
  });
});

describe('bad input answers 4xx naming the field (issue 17, item 9)', () => {
  const tamsin = 'ferncombe_tamsin';

  it('refuses a fall so small that the results overflow, in a calculation and in a site sheet', async () => {
    const calc = await call(saveCalculation, 'POST', '/api/calculations', tamsin, {
      tool: 'yield-estimate',
      inputs: { fall: '1e-320 m', lift: '10 m', driveFlow: '10 L/min' },
    });
    expect(calc.status).toBe(422);
    expect(calc.body.error.field).toBe('inputs.fall');
    const pipe = await call(saveCalculation, 'POST', '/api/calculations', tamsin, {
      tool: 'drive-pipe-check',
      inputs: { fall: '1e-320 m' },
    });
    expect(pipe.status).toBeGreaterThanOrEqual(400);
    expect(pipe.status).toBeLessThan(500);
    const question = await call(ask, 'POST', '/api/questions', tamsin, {
      title: 'Pump will not start on a tiny fall',
      body: 'The pump beats once and stops; the fall is very small here.',
      tags: ['stall'],
      siteSheet: { fall: '1e-320 m', lift: '10 m', driveLength: '10 m' },
    });
    expect(question.status).toBe(422);
    expect(question.body.error.field).toBe('siteSheet.fall');
  });

  it('refuses a lone surrogate in calculation inputs, site sheet symptoms and expert application links', async () => {
    const calc = await call(saveCalculation, 'POST', '/api/calculations', tamsin, {
      tool: 'yield-estimate',
      inputs: { fall: '4 ft', lift: '29 ft', driveFlow: '2 gal/min', note: '\ud800' },
    });
    expect(calc.status).toBe(400);
    expect(calc.body.error.field).toBe('inputs.note');
    const question = await call(ask, 'POST', '/api/questions', tamsin, {
      title: 'Pump stops after a minute of beating',
      body: 'It beats for a minute and then the waste valve hangs open.',
      tags: ['stall'],
      siteSheet: { symptoms: 'stops\ud800' },
    });
    expect(question.status).toBe(400);
    expect(question.body.error.field).toBe('siteSheet.symptoms');
    const application = await call(apply, 'POST', '/api/expert-applications', 'sorrel_cabin', {
      pumpsBuilt: 3,
      years: 2,
      region: 'Linnet valley',
      experience: 'Three rams on a spring-fed brook, tuned by ear.',
      links: ['https://example.org/\udc00'],
    });
    expect(application.status).toBe(400);
    expect(application.body.error.field).toBe('links.0');
  });

  it('refuses impossible dates in field log entries and CSV rows', async () => {
    const entry = {
      siteName: 'Date test brook',
      pumpSize: '1/2',
      fall: '4 ft',
      lift: '29 ft',
      driveLength: '30 ft',
      driveSize: '1/2',
      driveMaterial: 'pvc',
      driveFlow: '2 gal/min',
      driveFlowMethod: 'measured',
      trials: [{ volume: '0.5 L', seconds: 60 }],
    };
    for (const testedOn of ['2026-99-99', '2026-02-30', '0000-00-00', '2025-02-29']) {
      const res = await call(createEntry, 'POST', '/api/field-log', 'sorrel_cabin', { ...entry, testedOn });
      expect(res.status, testedOn).toBe(400);
      expect(res.body.error.field).toBe('testedOn');
    }
    // 2024 is a leap year (Gregorian rule, common practice, no source)
    expect(
      (await call(createEntry, 'POST', '/api/field-log', 'sorrel_cabin', { ...entry, testedOn: '2024-02-29' })).status,
    ).toBe(201);

    const fixture = readFileSync(path.join(__dirname, '../support/fixtures/field-log-import.csv'), 'utf8').split('\n');
    const good = fixture[1];
    const csv = [
      fixture[0],
      good.replace('2026-04-02', '2026-02-30'),
      good.replace('2026-04-02', '0000-00-00'),
      good.replace('2026-04-02', '2026-99-99'),
    ].join('\n');
    const imported = await call(importRoute, 'POST', '/api/field-log/import', 'sorrel_cabin', { csv });
    expect(imported.status).toBe(422);
    expect(imported.body.errors.map((e: { line: number; column: string }) => [e.line, e.column])).toEqual([
      [2, 'tested_on'],
      [3, 'tested_on'],
      [4, 'tested_on'],
    ]);
  });
});
