import { beforeAll, describe, expect, it } from 'vitest';
import { QueryTypes } from 'sequelize';
import { getSequelize } from '@/lib/db';
import { listQuestions } from '@/lib/questions/list';
import { listPageSchema } from '@/lib/validation/list-page';
import { loadThread, listRevisions } from '@/lib/questions/thread';
import { reviewQueue } from '@/lib/moderation/queue';
import { listAudit } from '@/lib/moderation/audit';
import { listMembersPage } from '@/lib/accounts/roles';
import { initModels } from '@/models';
import { insertBenchPosts } from '../../bench/seed-posts';
import { freshDemoDatabase } from '../support/db';

// 20,000 posts: enough that the optimiser prefers an index wherever one fits (common practice, no source)
const POSTS = 20_000;
/** A full scan of a table this big is a page that slows as the forum grows (tiny tables are scanned by choice). */
const LARGE_ROWS = 1_000;
/**
 * A query with no LIMIT that the optimiser expects to read this many rows reads a whole
 * list on every view, as COUNT(*) over the visible questions did (an index scan, not
 * a full one, so the check above missed it); a page reads its own rows and no more.
 */
const UNLIMITED_ROWS = 2_000;

interface PlanRow {
  table: string | null;
  type: string | null;
  key: string | null;
  rows: number | null;
  Extra: string | null;
}

/** Runs `work`, collects every SELECT it sends, and EXPLAINs each one. */
async function plans(work: () => Promise<unknown>) {
  const sequelize = getSequelize();
  // Sequelize reads its logging option on every query; it is not in the public types
  const options = (sequelize as unknown as { options: { logging: unknown } }).options;
  const seen: string[] = [];
  const before = options.logging;
  options.logging = (sql: string) => {
    const q = sql.replace(/^Executing \([^)]*\):\s*/, '');
    if (/^SELECT/i.test(q)) seen.push(q);
  };
  try {
    await work();
  } finally {
    options.logging = before;
  }
  const out: { sql: string; plan: PlanRow[] }[] = [];
  for (const sql of seen)
    out.push({ sql, plan: await sequelize.query<PlanRow>(`EXPLAIN ${sql}`, { type: QueryTypes.SELECT }) });
  return out;
}

function fullScans(found: Awaited<ReturnType<typeof plans>>) {
  return found.flatMap(({ sql, plan }) =>
    plan
      .filter((r) => r.type === 'ALL' && Number(r.rows ?? 0) >= LARGE_ROWS)
      .map((r) => `${r.table} (≈${r.rows} rows) in: ${sql.slice(0, 300)}`),
  );
}

function wholeListReads(found: Awaited<ReturnType<typeof plans>>) {
  return found
    .filter(({ sql }) => !/\bLIMIT\b/i.test(sql))
    .flatMap(({ sql, plan }) =>
      plan
        .filter((r) => Number(r.rows ?? 0) >= UNLIMITED_ROWS)
        .map((r) => `${r.table} (≈${r.rows} rows, ${r.type}) without a limit in: ${sql.slice(0, 300)}`),
    );
}

/** A place `down` questions down a list, as its own "Older" links would reach it (one scan here, in the test). */
async function placeDown(from: string, where: string, down: number) {
  const [row] = await getSequelize().query<{ at: Date; id: number }>(
    `SELECT ${from === 'question_tags' ? 'question_created_at AS at, question_id AS id' : 'created_at AS at, id'} FROM ${from}
      WHERE ${where} ORDER BY at DESC, id DESC LIMIT 1 OFFSET ${down}`,
    { type: QueryTypes.SELECT },
  );
  return listPageSchema.parse({ after: `${new Date(row.at).getTime()}-${row.id}` }).after!;
}

describe('every list query uses an index (EXPLAIN on 20,000 posts, real MariaDB)', () => {
  let bigThread: number;
  let member: number;
  let deep: Awaited<ReturnType<typeof placeDown>>;
  let deepInTag: Awaited<ReturnType<typeof placeDown>>;
  beforeAll(async () => {
    await freshDemoDatabase();
    await insertBenchPosts(getSequelize(), POSTS);
    await getSequelize().query('ANALYZE TABLE questions, answers, replies, question_tags, users, revisions', {
      type: QueryTypes.SELECT,
    });
    const [row] = await getSequelize().query<{ id: number }>(
      'SELECT id FROM questions ORDER BY answer_count DESC LIMIT 1',
      { type: QueryTypes.SELECT },
    );
    bigThread = row.id;
    member = (await initModels().User.findOne({ where: { handle: 'highcrag_shepherd' } }))!.id;
    // 20,000 posts hold about 5,000 questions, some 800 in each tag (bench/generate.ts)
    deep = await placeDown('questions', 'hidden_at IS NULL AND deleted_at IS NULL', 3_000);
    const frost = (await initModels().Tag.findOne({ where: { slug: 'frost' } }))!.id;
    deepInTag = await placeDown('question_tags', `tag_id = ${frost} AND question_listed = 1`, 500);
  }, 120_000);

  // the third element: a public list, read on every page view, which must not count or read its whole length
  const cases: [string, () => Promise<unknown>, 'public list'?][] = [
    ['questions, newest first, first page', () => listQuestions({ page: 1, perPage: 20 }), 'public list'],
    [
      'questions, newest first, the last page by number',
      () => listQuestions({ page: 10, perPage: 100 }),
      'public list',
    ],
    ['questions, newest first, 3,000 down (older)', () => listQuestions({ after: deep, perPage: 20 }), 'public list'],
    ['questions, newest first, 3,000 down (newer)', () => listQuestions({ before: deep, perPage: 20 }), 'public list'],
    ['unanswered questions', () => listQuestions({ page: 1, perPage: 20 }, { kind: 'unanswered' }), 'public list'],
    [
      'unanswered questions, further down',
      () => listQuestions({ after: deep, perPage: 20 }, { kind: 'unanswered' }),
      'public list',
    ],
    ['questions in a tag', () => listQuestions({ page: 1, perPage: 20 }, { kind: 'tag', tag: 'frost' }), 'public list'],
    [
      'questions in a tag, page 3',
      () => listQuestions({ page: 3, perPage: 20 }, { kind: 'tag', tag: 'frost' }),
      'public list',
    ],
    [
      'questions in a tag, 500 down',
      () => listQuestions({ after: deepInTag, perPage: 20 }, { kind: 'tag', tag: 'frost' }),
      'public list',
    ],
    ['the home page’s latest questions', () => listQuestions({ page: 1, perPage: 5 }), 'public list'],
    ['a member’s questions', () => listQuestions({ page: 1, perPage: 20 }, { kind: 'mine', userId: member })],
    ['questions a member follows', () => listQuestions({ page: 1, perPage: 20 }, { kind: 'followed', userId: member })],
    ['a thread with its answers and replies', () => loadThread(bigThread, null)],
    ['a post’s revisions', () => listRevisions(null, 1, 'question', 1)],
    ['the review queue', () => reviewQueue({})],
    ['the audit log', () => listAudit({})],
    ['the members list', () => listMembersPage(3)],
  ];

  for (const [name, work, list] of cases) {
    it(name, async () => {
      const found = await plans(work);
      expect(found.length, 'the case ran no SELECT').toBeGreaterThan(0);
      expect(fullScans(found)).toEqual([]);
      if (list) expect(wholeListReads(found)).toEqual([]);
    });
  }
});
