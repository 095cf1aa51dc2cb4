/**
 * Fills a benchmark database with the demo and then `count` invented posts
 * (bench/generate.ts): questions with tags and site sheets, answers and replies.
 *   DB_NAME=clackwater_test_bench npx tsx bench/seed-posts.ts 100000
 * Refuses any database whose name lacks "test" (it starts from empty).
 */
import { QueryTypes, type Sequelize } from 'sequelize';
import { getSequelize } from '@/lib/db';
import { resetDatabase } from '../tests/support/reset';
import { generatePosts, type BenchPost } from './generate';

/**
 * Adds `members` invented members and `count` invented posts by them to a database
 * that holds the demo (ids after the demo's).
 */
export async function insertBenchPosts(
  sequelize: Sequelize,
  count: number,
  members = Math.max(50, Math.round(count / 5)),
) {
  const one = async (sql: string) => (await sequelize.query<{ n: number }>(sql, { type: QueryTypes.SELECT }))[0].n;
  const uBase = await one('SELECT COALESCE(MAX(id), 0) AS n FROM users');
  const joined = new Date(Date.now() - 2000 * 86_400_000);
  for (let from = 1; from <= members; from += 5000) {
    const rows = [];
    for (let i = from; i < Math.min(from + 5000, members + 1); i++) {
      rows.push({
        id: uBase + i,
        handle: `bench_member_${i}`,
        display_name: `Bench member ${i}`,
        email: `member${i}@bench.example`,
        role: 'member',
        units: i % 3 ? 'US' : 'metric',
        email_verified_at: joined,
        created_at: joined,
        updated_at: joined,
      });
    }
    await sequelize.getQueryInterface().bulkInsert('users', rows);
  }
  const users = (
    await sequelize.query<{ id: number }>("SELECT id FROM users WHERE role IN ('member', 'expert') ORDER BY id", {
      type: QueryTypes.SELECT,
    })
  ).map((u) => u.id);
  const tagIds = new Map(
    (await sequelize.query<{ id: number; slug: string }>('SELECT id, slug FROM tags', { type: QueryTypes.SELECT })).map(
      (t) => [t.slug, t.id],
    ),
  );
  const qBase = await one('SELECT COALESCE(MAX(id), 0) AS n FROM questions');
  const aBase = await one('SELECT COALESCE(MAX(id), 0) AS n FROM answers');
  const rBase = await one('SELECT COALESCE(MAX(id), 0) AS n FROM replies');
  const now = Date.now();
  let batch: BenchPost[] = [];
  const flush = async () => {
    const when = (p: BenchPost) => new Date(now - p.daysAgo * 86_400_000);
    const author = (p: BenchPost) => users[(p.id * 7 + (p.kind === 'question' ? 0 : 3)) % users.length];
    const qs = batch.filter((p) => p.kind === 'question');
    const as = batch.filter((p) => p.kind === 'answer');
    const rs = batch.filter((p) => p.kind === 'reply');
    await sequelize.transaction(async (transaction) => {
      if (qs.length) {
        await sequelize.getQueryInterface().bulkInsert(
          'questions',
          qs.map((p) => ({
            id: qBase + p.id,
            author_id: author(p),
            title: p.title.slice(0, 160),
            body: p.body,
            answer_count: 0,
            fixed_answer_id: null,
            site_sheet: JSON.stringify(p.siteSheet),
            helpful_count: 0,
            last_activity_at: when(p),
            hidden_at: p.hidden ? when(p) : null,
            hidden_reason: p.hidden ? 'benchmark' : null,
            created_at: when(p),
            updated_at: when(p),
          })),
          { transaction },
        );
        await sequelize.getQueryInterface().bulkInsert(
          'question_tags',
          qs.flatMap((p) => p.tags.map((t) => ({ question_id: qBase + p.id, tag_id: tagIds.get(t)! }))),
          { transaction },
        );
      }
      if (as.length)
        await sequelize.getQueryInterface().bulkInsert(
          'answers',
          as.map((p) => ({
            id: aBase + p.id,
            question_id: qBase + p.questionId,
            author_id: author(p),
            body: p.body,
            helpful_count: 0,
            hidden_at: p.hidden ? when(p) : null,
            created_at: when(p),
            updated_at: when(p),
          })),
          { transaction },
        );
      if (rs.length)
        await sequelize.getQueryInterface().bulkInsert(
          'replies',
          rs.map((p) => ({
            id: rBase + p.id,
            question_id: qBase + p.questionId,
            parent_type: 'question',
            answer_id: null,
            reply_to_id: null,
            depth: 0,
            author_id: author(p),
            body: p.body,
            helpful_count: 0,
            hidden_at: p.hidden ? when(p) : null,
            created_at: when(p),
            updated_at: when(p),
          })),
          { transaction },
        );
    });
    batch = [];
  };
  for (const p of generatePosts(count)) {
    batch.push(p);
    if (batch.length === 4000) await flush();
  }
  await flush();
  await sequelize.query(
    'UPDATE questions q SET answer_count = (SELECT COUNT(*) FROM answers a WHERE a.question_id = q.id)',
  );
}

async function main() {
  const count = Number(process.argv[2] ?? 100_000);
  const sequelize = getSequelize();
  const t0 = performance.now();
  await resetDatabase(sequelize);
  await insertBenchPosts(sequelize, count, process.argv[3] ? Number(process.argv[3]) : undefined);
  console.log(
    `seeded ${count} invented posts into ${sequelize.getDatabaseName()} in ${((performance.now() - t0) / 1000).toFixed(1)} s`,
  );
  await sequelize.close();
}

if (require.main === module) {
  main().catch((err) => {
    console.error(`bench seed failed: ${err instanceof Error ? err.message : String(err)}`);
    process.exit(1);
  });
}
