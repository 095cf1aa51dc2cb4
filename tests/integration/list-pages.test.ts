import { beforeAll, describe, expect, it } from 'vitest';
import { QueryTypes } from 'sequelize';
import { getSequelize } from '@/lib/db';
import { listQuestions, type ListFilter } from '@/lib/questions/list';
import { listPageSchema, MAX_NUMBERED_PAGE } from '@/lib/validation/list-page';
import { GET as listGET } from '@/app/api/questions/route';
import { freshDemoDatabase } from '../support/db';
import { actAs } from '../support/act-as';

const { call } = actAs('10.23.1');
const place = (text: string) => listPageSchema.parse({ after: text }).after!;

/** The visible questions newest first, from scratch. */
async function expected(filter: 'all' | 'frost') {
  return (
    await getSequelize().query<{ id: number }>(
      `SELECT q.id FROM questions q ${filter === 'frost' ? "JOIN question_tags qt ON qt.question_id = q.id JOIN tags t ON t.id = qt.tag_id AND t.slug = 'frost'" : ''}
        WHERE q.hidden_at IS NULL AND q.deleted_at IS NULL ORDER BY q.created_at DESC, q.id DESC`,
      { type: QueryTypes.SELECT },
    )
  ).map((r) => r.id);
}

/** Walks a list as a reader does: pages by number while they last, then each page's "Older" link. */
async function walk(perPage: number, filter: ListFilter) {
  const seen: number[] = [];
  const pages = [];
  let page = await listQuestions({ page: 1, perPage }, filter);
  for (;;) {
    pages.push(page);
    seen.push(...page.items.map((i) => i.id));
    if (!page.older) break;
    const n = page.page;
    page =
      n !== null && n < MAX_NUMBERED_PAGE
        ? await listQuestions({ page: n + 1, perPage }, filter)
        : await listQuestions({ after: place(page.older), perPage }, filter);
  }
  return { seen, pages };
}

describe('the question lists page by number, then by place (real MariaDB)', () => {
  beforeAll(freshDemoDatabase);

  it('every visible question once, newest first, past the numbered pages and back', async () => {
    const all = await expected('all');
    // 2 a page: more than MAX_NUMBERED_PAGE pages of demo questions, so the walk goes on by place
    expect(all.length).toBeGreaterThan(2 * MAX_NUMBERED_PAGE);
    const { seen, pages } = await walk(2, { kind: 'newest' });
    expect(seen).toEqual(all);
    expect(pages.some((p) => p.page === null)).toBe(true);
    expect(pages.every((p) => p.total === all.length)).toBe(true);
    // back again by each page's "Newer" link, from the oldest page
    const last = pages[pages.length - 1];
    let back = last;
    const again: number[][] = [];
    for (let i = pages.length - 1; i > 0 && back.newer; i--) {
      back = await listQuestions({ before: place(back.newer), perPage: 2 });
      again.unshift(back.items.map((x) => x.id));
    }
    expect(again.flat()).toEqual(all.slice(0, all.length - last.items.length));
    expect(back.page).toBe(1); // the newest page is the first page, by number
  });

  it('a tag’s list the same way', async () => {
    const { seen } = await walk(1, { kind: 'tag', tag: 'frost' });
    expect(seen).toEqual(await expected('frost'));
  });

  it('GET /api/questions takes after and refuses pages past the numbered ones, naming the field', async () => {
    const first = await call(listGET, 'GET', '/api/questions?perPage=3', null);
    expect(first.status).toBe(200);
    const next = await call(listGET, 'GET', `/api/questions?perPage=3&after=${first.body.older}`, null);
    expect(next.status).toBe(200);
    const all = await expected('all');
    expect(next.body.items.map((i: { id: number }) => i.id)).toEqual(all.slice(3, 6));
    for (const [query, field] of [
      [`page=${MAX_NUMBERED_PAGE + 1}`, 'page'],
      ['after=yesterday', 'after'],
      ['before=12-x', 'before'],
      [`after=${first.body.older}&before=${first.body.older}`, 'before'],
    ]) {
      const res = await call(listGET, 'GET', `/api/questions?${query}`, null);
      expect(res.status, query).toBe(400);
      expect(res.body.error.field, query).toBe(field);
    }
  });
});
