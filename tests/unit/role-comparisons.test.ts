import { readdirSync, readFileSync, statSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';

const ROOT = path.resolve(__dirname, '../..');

/**
 * Who may do what is decided by rows of lib/auth/policy.ts, asked through can();
 * a comparison of a role with a role's name anywhere else is a second, unseen policy.
 * The few left are not permissions: each is named here with why.
 */
const NOT_PERMISSIONS: { file: string; text: string; why: string }[] = [
  {
    file: 'lib/accounts/roles.ts',
    text: "applicant.role === 'member'",
    why: 'approving an application moves a member to expert, never demotes a moderator',
  },
  {
    file: 'components/moderation/ReviewItem.tsx',
    text: "f.flagger.role !== 'member'",
    why: 'shows the flagger’s role beside the flag',
  },
  {
    file: 'lib/questions/thread.ts',
    text: "u?.role === 'expert'",
    why: 'labels an expert’s post; owner of lib/questions to move it to a policy row',
  },
];

function sources(dir: string, out: string[] = []): string[] {
  for (const name of readdirSync(dir)) {
    const full = path.join(dir, name);
    if (statSync(full).isDirectory()) sources(full, out);
    else if (/\.(ts|tsx)$/.test(name)) out.push(full);
  }
  return out;
}

describe('role comparisons live in the policy table only', () => {
  it('no file under lib, app or components compares a role with a role name outside lib/auth/policy.ts', () => {
    const literal =
      /\brole\s*[!=]==?\s*['"](member|expert|moderator|admin)['"]|['"](member|expert|moderator|admin)['"]\s*[!=]==?\s*[\w?.]*role\b|ROLES\.has\(/g;
    const found: string[] = [];
    for (const dir of ['lib', 'app', 'components']) {
      for (const file of sources(path.join(ROOT, dir))) {
        const rel = path.relative(ROOT, file).split(path.sep).join('/');
        if (rel === 'lib/auth/policy.ts') continue;
        readFileSync(file, 'utf8')
          .split('\n')
          .forEach((line, i) => {
            if (!literal.test(line)) return;
            literal.lastIndex = 0;
            if (NOT_PERMISSIONS.some((n) => n.file === rel && line.includes(n.text))) return;
            found.push(`${rel}:${i + 1}: ${line.trim()}`);
          });
        literal.lastIndex = 0;
      }
    }
    expect(found, 'add a row to lib/auth/policy.ts and ask can() instead').toEqual([]);
  });
});
