import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { importClosure, importsOf, sourceFiles, target } from '@/tests/support/import-graph';

const root = path.resolve(__dirname, '../..');

describe('layers of the code', () => {
  it('asking a question on the server pulls in no component, no client module, no chart or SWR code', () => {
    const { files, packages, client } = importClosure(root, 'lib/questions/posts.ts');
    expect(files.filter((f) => f.startsWith('components/') || f.startsWith('app/'))).toEqual([]);
    expect(client).toEqual([]);
    expect(packages).not.toContain('recharts');
    expect(packages).not.toContain('swr');
  });

  it('the calculator core reaches no React, Next or database', () => {
    const { files, packages } = importClosure(root, 'lib/calculators/index.ts');
    expect(files.filter((f) => /^(app|components|models)\/|^lib\/db\//.test(f))).toEqual([]);
    expect(packages.filter((p) => /^(react|react-dom|next|next-auth|sequelize|mariadb|swr|recharts)$/.test(p))).toEqual(
      [],
    );
  });

  it('nothing under lib/ imports from app/ or components/, not even a type', () => {
    const back = sourceFiles(root, 'lib').flatMap((f) =>
      importsOf(path.join(root, f), { types: true })
        .map((spec) => target(root, f, spec))
        .filter((t) => t.startsWith('app/') || t.startsWith('components/'))
        .map((t) => `${f} → ${t}`),
    );
    expect(back).toEqual([]);
  });
});
