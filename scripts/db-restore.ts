/**
 * npm run db:restore -- <file.sql.gz> [--force] — loads a backup made by db:backup
 * into the configured database (DB_NAME or DATABASE_URL). A database that already
 * holds tables is refused unless --force: a restore replaces what is there.
 */
import { spawn } from 'node:child_process';
import { createReadStream, existsSync } from 'node:fs';
import { pipeline } from 'node:stream/promises';
import { createGunzip } from 'node:zlib';
import { QueryTypes } from 'sequelize';
import { readDbConfig, type DbConfig } from '@/lib/db/config';
import { createSequelize } from '@/lib/db';
import { forgetSavedPages } from '@/lib/questions/saved-pages';

export async function restoreDatabase(
  file: string,
  cfg: DbConfig = readDbConfig(),
  opts: { force?: boolean } = {},
): Promise<void> {
  if (!existsSync(file)) throw new Error(`no backup file at ${file}`);
  // the primary only: whether the database is empty must not be a replica's older answer
  const admin = createSequelize({ ...cfg, database: '', replicas: [] });
  try {
    await admin.query(
      `CREATE DATABASE IF NOT EXISTS \`${cfg.database.replace(/`/g, '')}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`,
    );
    const [{ n }] = await admin.query<{ n: number }>(
      'SELECT COUNT(*) AS n FROM information_schema.tables WHERE table_schema = ?',
      { replacements: [cfg.database], type: QueryTypes.SELECT },
    );
    if (Number(n) > 0 && !opts.force)
      throw new Error(
        `database ${cfg.database} already has ${n} tables: restore replaces them; add --force to go ahead`,
      );
  } finally {
    await admin.close();
  }
  const client = spawn(
    'mariadb',
    [
      '--no-defaults',
      '--default-character-set=utf8mb4',
      `--host=${cfg.host}`,
      `--port=${cfg.port}`,
      `--user=${cfg.user}`,
      cfg.database,
    ],
    {
      env: { ...process.env, MYSQL_PWD: cfg.password },
      stdio: ['pipe', 'ignore', 'pipe'],
    },
  );
  let stderr = '';
  client.stderr.on('data', (d) => (stderr += d));
  const exited = new Promise<number>((resolve, reject) => {
    client.on('error', reject);
    client.on('close', (code) => resolve(code ?? 1));
  });
  await pipeline(createReadStream(file), createGunzip(), client.stdin);
  const code = await exited;
  if (code !== 0) throw new Error(`restore failed (exit ${code}): ${stderr.trim()}`);
}

if (require.main === module) {
  const args = process.argv.slice(2);
  const file = args.find((a) => !a.startsWith('--'));
  if (!file) {
    console.error('usage: npm run db:restore -- <backup.sql.gz> [--force]');
    process.exit(2);
  }
  restoreDatabase(file, readDbConfig(), { force: args.includes('--force') })
    .then(() => {
      forgetSavedPages();
      console.log(`restored ${file} into ${readDbConfig().database}; restart the app so no page from before is served`);
    })
    .catch((err) => {
      console.error(`restore failed: ${err instanceof Error ? err.message : String(err)}`);
      process.exit(1);
    });
}
