import { createHash } from 'node:crypto';
import { mkdtempSync, rmSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { QueryTypes, type Sequelize } from 'sequelize';
import { createSequelize, getSequelize } from '@/lib/db';
import { readDbConfig } from '@/lib/db/config';
import { backupDatabase } from '@/scripts/db-backup';
import { restoreDatabase } from '@/scripts/db-restore';
import { initModels } from '@/models';
import { freshDemoDatabase } from '../support/db';

/** Row count of every table, and a sha256 over every post's id, title and body in order. */
async function fingerprint(db: Sequelize) {
  const tables = (
    await db.query<{ t: string }>(
      'SELECT table_name AS t FROM information_schema.tables WHERE table_schema = DATABASE() ORDER BY table_name',
      { type: QueryTypes.SELECT },
    )
  ).map((r) => r.t);
  const counts: Record<string, number> = {};
  for (const t of tables)
    counts[t] = Number(
      (await db.query<{ n: number }>(`SELECT COUNT(*) AS n FROM \`${t}\``, { type: QueryTypes.SELECT }))[0].n,
    );
  const hash = createHash('sha256');
  for (const sql of [
    'SELECT id, title, body FROM questions ORDER BY id',
    'SELECT id, body FROM answers ORDER BY id',
    'SELECT id, body FROM replies ORDER BY id',
  ]) {
    for (const row of await db.query<Record<string, unknown>>(sql, { type: QueryTypes.SELECT }))
      hash.update(`${JSON.stringify(row)}\n`);
  }
  return { counts, posts: hash.digest('hex') };
}

describe('db:backup and db:restore (mariadb-dump, real MariaDB)', () => {
  const dir = mkdtempSync(path.join(tmpdir(), 'cw-backup-'));
  const target = { ...readDbConfig(), database: 'clackwater_test_restore' };
  let restored: Sequelize;

  beforeAll(async () => {
    await freshDemoDatabase();
    // words that a careless dump or restore would mangle
    const { Question } = initModels();
    await Question.update(
      { body: 'Ünïcödé ≥ 1¼" — 水 — \'; DROP TABLE questions; -- \\ \u{1F4A7}' },
      { where: { id: 1 } },
    );
    const admin = createSequelize({ database: '' });
    await admin.query('DROP DATABASE IF EXISTS `clackwater_test_restore`');
    await admin.close();
  });
  afterAll(async () => {
    await restored?.close();
    rmSync(dir, { recursive: true, force: true });
  });

  it('restores a backup into a fresh database with the same rows and the same posts', async () => {
    const file = await backupDatabase(path.join(dir, 'backup.sql.gz'));
    expect(statSync(file).size).toBeGreaterThan(1000);
    await restoreDatabase(file, target);
    restored = createSequelize({ database: target.database });
    const before = await fingerprint(getSequelize());
    const after = await fingerprint(restored);
    expect(Object.keys(after.counts).length).toBeGreaterThan(10);
    expect(after.counts).toEqual(before.counts);
    expect(after.posts).toBe(before.posts);
    const [row] = await restored.query<{ body: string }>('SELECT body FROM questions WHERE id = 1', {
      type: QueryTypes.SELECT,
    });
    expect(row.body).toBe('Ünïcödé ≥ 1¼" — 水 — \'; DROP TABLE questions; -- \\ \u{1F4A7}');
  });

  it('refuses to restore over a database that has tables, unless forced', async () => {
    const file = path.join(dir, 'backup.sql.gz');
    await expect(restoreDatabase(file, target)).rejects.toThrow(/already has \d+ tables.*--force/);
    await expect(restoreDatabase(file, target, { force: true })).resolves.toBeUndefined();
    await expect(restoreDatabase(path.join(dir, 'missing.sql.gz'), target)).rejects.toThrow(/no backup file/);
  });
});
