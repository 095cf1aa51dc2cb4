import { beforeAll, describe, expect, it } from 'vitest';
import { NextRequest } from 'next/server';
import { GET } from '@/app/api/questions/route';
import { demoQuestions as baseQuestions } from '@/migrations/seed/demo-data';
import { demoThreads } from '@/migrations/seed/demo-forum-data';

const demoQuestions = [...baseQuestions, ...demoThreads];
import { freshDemoDatabase } from '../support/db';

const get = (qs: string) => GET(new NextRequest(`http://localhost/api/questions${qs}`));

describe('GET /api/questions', () => {
  beforeAll(freshDemoDatabase);

  it('pages through every seeded question exactly once, newest first', async () => {
    const perPage = 5;
    const seen: number[] = [];
    const dates: string[] = [];
    const expectedPages = Math.ceil(demoQuestions.length / perPage);
    for (let page = 1; page <= expectedPages; page++) {
      const res = await get(`?page=${page}&perPage=${perPage}`);
      expect(res.status).toBe(200);
      const body = await res.json();
      expect(body).toMatchObject({ page, perPage, total: demoQuestions.length, totalPages: expectedPages });
      expect(body.items.length).toBe(
        page < expectedPages ? perPage : demoQuestions.length - perPage * (expectedPages - 1),
      );
      for (const item of body.items) {
        seen.push(item.id);
        dates.push(item.createdAt);
      }
    }
    expect(new Set(seen).size).toBe(demoQuestions.length);
    expect([...dates].sort().reverse()).toEqual(dates);
    const beyond = await (await get(`?page=${expectedPages + 1}&perPage=${perPage}`)).json();
    expect(beyond.items).toEqual([]);
  });

  it('defaults to page 1 of 20', async () => {
    const body = await (await get('')).json();
    expect(body.page).toBe(1);
    expect(body.perPage).toBe(20);
  });

  it.each([
    ['?page=abc', 'page'],
    ['?page=0', 'page'],
    ['?page=-1', 'page'],
    ['?page=1.5', 'page'],
    ['?perPage=0', 'perPage'],
    ['?perPage=1000', 'perPage'],
    ['?perPage=ten', 'perPage'],
  ])('answers %s with 400 naming %s', async (qs, field) => {
    const res = await get(qs);
    expect(res.status).toBe(400);
    const body = await res.json();
    expect(body.error.field).toBe(field);
    expect(typeof body.error.message).toBe('string');
    expect(body.error.message).toContain(field);
  });
});
