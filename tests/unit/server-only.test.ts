import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';

/*
 * Modules that must never reach a browser bundle start with `import 'server-only'`, so
 * `next build` fails when a client component pulls one in. Pure helpers the browser
 * uses (the permission table, the route→action table, the sign-in return path and error words, the search text helpers) are the
 * listed exceptions.
 */
const root = path.resolve(__dirname, '../..');
const GUARDED_DIRS = ['lib/db', 'lib/auth', 'lib/mail', 'lib/search', 'models'];
const BROWSER_SAFE = new Set([
  'lib/auth/policy.ts',
  'lib/auth/routes.ts',
  'lib/auth/return-path.ts',
  'lib/auth/sign-in-errors.ts',
  'lib/search/normalize.ts',
  'lib/search/snippet.ts',
]);

const GUARDED_FILES = ['lib/redis.ts'];

const modules = [
  ...GUARDED_DIRS.flatMap((dir) =>
    readdirSync(path.join(root, dir))
      .filter((f) => /\.tsx?$/.test(f))
      .map((f) => `${dir}/${f}`)
      .filter((f) => !BROWSER_SAFE.has(f)),
  ),
  ...GUARDED_FILES,
];

describe('server-only modules', () => {
  it.each(modules)("%s imports 'server-only'", (file) => {
    expect(readFileSync(path.join(root, file), 'utf8')).toMatch(/^import 'server-only';$/m);
  });
});
