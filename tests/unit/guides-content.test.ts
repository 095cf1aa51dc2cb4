import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { contentHash, listGuides, neighbours, readGuideFile } from '@/lib/guides/content';
import { safetyState, safetyStatus, type SafetyCheckView } from '@/lib/guides/safety';

const front = (title: string, order: number) =>
  `---\ntitle: "${title}"\nsummary: "A summary long enough."\nlevel: "first build"\ntags: ["survey"]\nupdated: "2026-11-01"\norder: ${order}\ncalculators: []\n---\n\n## A heading\n\nBody of ${title}.\n`;

describe('guide content', () => {
  it('hashes the whole file, and the hash changes when the file changes', () => {
    const dir = mkdtempSync(path.join(tmpdir(), 'guides-'));
    writeFileSync(path.join(dir, 'a.mdx'), front('Alpha', 1));
    const before = readGuideFile('a', dir)!.hash;
    // sha256 of the empty string, from FIPS 180-4 test vectors (NIST, 2015)
    expect(contentHash('')).toBe('e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855');
    expect(before).toBe(contentHash(front('Alpha', 1)));
    writeFileSync(path.join(dir, 'a.mdx'), front('Alpha', 1).replace('Body', 'Edited body'));
    expect(readGuideFile('a', dir)!.hash).not.toBe(before);
  });

  it('lists guides in reading order with previous and next', () => {
    const dir = mkdtempSync(path.join(tmpdir(), 'guides-'));
    writeFileSync(path.join(dir, 'b.mdx'), front('Beta', 2));
    writeFileSync(path.join(dir, 'a.mdx'), front('Alpha', 1));
    writeFileSync(path.join(dir, 'c.mdx'), front('Gamma', 3));
    const guides = listGuides(dir);
    expect(guides.map((g) => g.slug)).toEqual(['a', 'b', 'c']);
    const n = neighbours('b', guides);
    expect([n.previous?.slug, n.next?.slug]).toEqual(['a', 'c']);
    expect(neighbours('a', guides).previous).toBeNull();
  });

  it('refuses a guide whose frontmatter is incomplete, naming the field', () => {
    const dir = mkdtempSync(path.join(tmpdir(), 'guides-'));
    writeFileSync(path.join(dir, 'x.mdx'), front('Xylo', 1).replace('level: "first build"\n', 'level: "expert"\n'));
    expect(() => readGuideFile('x', dir)).toThrow(/level/);
    expect(readGuideFile('../etc/passwd', dir)).toBeNull();
  });
});

describe('safety status', () => {
  const check = (current: boolean, id = 1, verdict: SafetyCheckView['verdict'] = 'sound'): SafetyCheckView => ({
    id,
    verdict,
    notes: null,
    expert: { handle: 'e', displayName: 'E' },
    checkedAt: '2026-11-01T00:00:00Z',
    current,
    checkedVersionUpdated: null,
    hasText: false,
  });
  it('is checked, changed or not checked by the newest check', () => {
    expect(safetyStatus([]).state).toBe('not checked');
    expect(safetyStatus([check(true)]).state).toBe('checked');
    expect(safetyStatus([check(false), check(true, 2)]).state).toBe('changed');
  });
  it('says "needs changes" when the newest check on this text asked for changes, never "checked"', () => {
    expect(safetyStatus([check(true, 1, 'needs changes')]).state).toBe('needs changes');
    expect(safetyStatus([check(true, 2, 'needs changes'), check(true, 1)]).state).toBe('needs changes');
    expect(safetyStatus([check(true, 2), check(true, 1, 'needs changes')]).state).toBe('checked');
    // an edit after a "needs changes" check: the text is no longer the one judged
    expect(safetyStatus([check(false, 1, 'needs changes')]).state).toBe('changed');
    expect(safetyState(undefined)).toBe('not checked');
  });
});
