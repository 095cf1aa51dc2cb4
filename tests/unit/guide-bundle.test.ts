/**
 * What a guide's calculators cost its first load (issue 23, "light pages on a phone"):
 * the browser code the guide's HTML names is what its client modules import statically;
 * the live cards, with the engine and zod, come later through import(). And each card
 * brings its own calculator, not the list of all of them. The measured sizes are
 * bench/guide-first-load.ts's; this keeps the structure that makes them small.
 */
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { importClosure } from '@/tests/support/import-graph';

const root = path.resolve(__dirname, '../..');

/** The client modules a server module reaches, and everything they import statically (the first load). */
function firstLoad(entry: string) {
  const server = importClosure(root, entry, { dynamic: false });
  const files = new Set<string>();
  const packages = new Set<string>();
  for (const c of server.client) {
    const b = importClosure(root, c, { dynamic: false });
    b.files.forEach((f) => files.add(f));
    b.packages.forEach((p) => packages.add(p));
  }
  return { files: [...files].sort(), packages: [...packages].sort() };
}

describe('a guide’s first load', () => {
  it('carries no calculator engine, definition or validation: the cards fetch theirs after hydration', () => {
    const { files, packages } = firstLoad('components/guides/mdx-components.tsx');
    expect(files.length, 'the guide has client code at all').toBeGreaterThan(0);
    expect(files.filter((f) => /^lib\/(hydraulics|calculators)\//.test(f))).toEqual([]);
    expect(files.filter((f) => f.startsWith('components/calculators/kit/'))).toEqual([]);
    expect(packages.filter((p) => /^(zod|js-quantities|swr|katex)$/.test(p))).toEqual([]);
  });

  it('neither the layout (a visitor’s header) nor the guide page brings the policy table or a chart', () => {
    for (const entry of ['app/layout.tsx', 'app/guides/[slug]/page.tsx']) {
      const { files } = firstLoad(entry);
      expect(
        files.filter((f) => f === 'lib/auth/policy.ts' || f.startsWith('components/charts/')),
        entry,
      ).toEqual([]);
    }
  });
});

describe('a live card on a guide', () => {
  const defs = [
    ['deliveryLine', 'delivery-line'],
    ['yieldEstimate', 'yield-estimate'],
    ['stallCheck', 'stall-check'],
  ] as const;
  for (const [name] of defs) {
    it(`${name} brings its own definition and view, not the registry of every calculator`, () => {
      const { files } = importClosure(root, `components/calculators/live/${name}.tsx`);
      expect(files).toContain(`lib/calculators/defs/${name}.ts`);
      expect(
        files.filter((f) => f.startsWith('lib/calculators/defs/') && f !== `lib/calculators/defs/${name}.ts`),
      ).toEqual([]);
      expect(files).not.toContain('lib/calculators/registry.ts');
      expect(files).not.toContain('lib/calculators/index.ts');
      expect(files).not.toContain('components/calculators/views/index.ts');
    });
  }
});
