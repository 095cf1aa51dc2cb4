/**
 * npm run db:backup [file] — a consistent dump of the database (mariadb-dump
 * --single-transaction: no locks, one snapshot), gzipped, to .data/backups/ unless a
 * file is named. Uploaded photos live in the upload directory: back that up beside it.
 */
import { spawn } from 'node:child_process';
import { createWriteStream, mkdirSync } from 'node:fs';
import path from 'node:path';
import { pipeline } from 'node:stream/promises';
import { createGzip } from 'node:zlib';
import { readDbConfig } from '@/lib/db/config';

export async function backupDatabase(file: string, cfg = readDbConfig()): Promise<string> {
  mkdirSync(path.dirname(file), { recursive: true });
  const dump = spawn(
    'mariadb-dump',
    [
      '--no-defaults',
      '--single-transaction',
      '--quick',
      '--routines',
      '--triggers',
      '--hex-blob',
      '--default-character-set=utf8mb4',
      `--host=${cfg.host}`,
      `--port=${cfg.port}`,
      `--user=${cfg.user}`,
      cfg.database,
    ],
    { env: { ...process.env, MYSQL_PWD: cfg.password }, stdio: ['ignore', 'pipe', 'pipe'] },
  );
  let stderr = '';
  dump.stderr.on('data', (d) => (stderr += d));
  const exited = new Promise<number>((resolve, reject) => {
    dump.on('error', reject);
    dump.on('close', (code) => resolve(code ?? 1));
  });
  await pipeline(dump.stdout, createGzip(), createWriteStream(file));
  const code = await exited;
  if (code !== 0) throw new Error(`mariadb-dump failed (exit ${code}): ${stderr.trim()}`);
  return file;
}

if (require.main === module) {
  const stamp = new Date().toISOString().replace(/[-:]/g, '').replace(/\..*/, '').replace('T', '-');
  const file = path.resolve(
    process.argv[2] ?? path.join('.data', 'backups', `${readDbConfig().database}-${stamp}.sql.gz`),
  );
  backupDatabase(file)
    .then((f) => console.log(`backup written: ${f}`))
    .catch((err) => {
      console.error(`backup failed: ${err instanceof Error ? err.message : String(err)}`);
      process.exit(1);
    });
}
