import { beforeAll, describe, expect, it } from 'vitest';
import { QueryTypes } from 'sequelize';
import { getSequelize } from '@/lib/db';
import { listQuestions } from '@/lib/questions/list';
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

describe('every list query uses an index (EXPLAIN on 20,000 posts, real MariaDB)', () => {
  let bigThread: number;
  let member: number;
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
  }, 120_000);

  const cases: [string, () => Promise<unknown>][] = [
    ['questions, newest first, first page', () => listQuestions({ page: 1, perPage: 20 })],
    ['questions, newest first, page 200', () => listQuestions({ page: 200, perPage: 20 })],
    ['unanswered questions', () => listQuestions({ page: 1, perPage: 20 }, { kind: 'unanswered' })],
    ['questions in a tag', () => listQuestions({ page: 1, perPage: 20 }, { kind: 'tag', tag: 'frost' })],
    ['a member’s questions', () => listQuestions({ page: 1, perPage: 20 }, { kind: 'mine', userId: member })],
    ['questions a member follows', () => listQuestions({ page: 1, perPage: 20 }, { kind: 'followed', userId: member })],
    ['a thread with its answers and replies', () => loadThread(bigThread, null)],
    ['a post’s revisions', () => listRevisions(null, 1, 'question', 1)],
    ['the review queue', () => reviewQueue({})],
    ['the audit log', () => listAudit({})],
    ['the members list', () => listMembersPage(3)],
  ];

  for (const [name, work] of cases) {
    it(name, async () => {
      const found = await plans(work);
      expect(found.length, 'the case ran no SELECT').toBeGreaterThan(0);
      expect(fullScans(found)).toEqual([]);
    });
  }
});
