/**
 * Runs every worked example written in the engine's doc comments (the
 * `@example` blocks, syntax in doctest-runner.ts), so a comment and the code
 * cannot drift apart. The expected numbers are the comments' own worked
 * examples, each citing its source in the comment above it.
 */
import fs from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import * as engine from '@/lib/hydraulics';
import * as friction from '@/lib/hydraulics/friction';
import { docBlocks, extractExamples, runExample, writtenPrecision, type Example } from './doctest-runner';

const DIR = path.resolve(__dirname, '../../lib/hydraulics');
const FILES = fs
  .readdirSync(DIR)
  .filter((f) => f.endsWith('.ts'))
  .sort();
const sources = new Map(FILES.map((f) => [f, fs.readFileSync(path.join(DIR, f), 'utf8')]));
const examples: Example[] = FILES.flatMap((f) => extractExamples(sources.get(f)!, f));

async function scopeFor(file: string): Promise<Record<string, unknown>> {
  const own = (await import(path.join(DIR, file))) as Record<string, unknown>;
  return { ...engine, ...own };
}

const report = (ex: Example, failures: ReturnType<typeof runExample>) =>
  failures.map((f) => `${ex.file}:${f.line} ${f.code.replace(/\s+/g, ' ')}\n    ${f.message}`);

describe('engine doc-comment examples', () => {
  it('are found', () => {
    expect(examples.length).toBeGreaterThan(50);
  });
  for (const ex of examples) {
    it(`${ex.file}:${ex.line} ${ex.owner ?? ''} ${ex.caption}`.trim(), async () => {
      expect(report(ex, runExample(ex, await scopeFor(ex.file)))).toEqual([]);
    });
  }
});

/** Exported functions exempt from needing an example: they compute nothing a reader would check. */
const NO_NUMBER: Record<string, string> = {
  addRangeIssue: "adds a zod issue inside a refinement; covered by every calculator's invalid-input tests",
};

/** Engine files whose exports compute nothing (none today). */
const SKIP_FILES = new Set<string>();

describe('every exported function has a worked example', () => {
  const owners = new Set(examples.map((e) => `${e.file}:${e.owner}`));
  for (const file of FILES.filter((f) => !SKIP_FILES.has(f))) {
    const src = sources.get(file)!;
    const exported = [...src.matchAll(/^export function\s+([A-Za-z_$][\w$]*)/gm)].map((m) => m[1]!);
    for (const name of exported.filter((n) => !(n in NO_NUMBER))) {
      it(`${file}: ${name}`, () => {
        expect(owners.has(`${file}:${name}`), `${name} in ${file} needs an @example in its doc comment`).toBe(true);
      });
    }
  }
});

describe('the doctest runner itself', () => {
  // reynolds() is not in the public API: the scope of an example in friction.ts
  const scope = { ...engine, ...friction };
  const run = (comment: string) => {
    const src = `${comment}\nexport function f() {}\n`;
    return extractExamples(src, 'fake.ts').flatMap((ex) => runExample(ex, scope));
  };

  it('reports a deliberately wrong example', () => {
    // 1 m/s in 26.6 mm at 1.306e-6 m²/s gives Re = 20,368 (arithmetic), not 25,000
    const failures = run(`/**
 * @example
 * reynolds(1, 0.0266, 1.306e-6)  // ≈ 25000 ±1%
 */`);
    expect(failures).toHaveLength(1);
    expect(failures[0]!.message).toMatch(/expected ≈ 25000 ± 250, got 20367\.53/);
    expect(failures[0]!.line).toBe(3);
  });

  it('passes the same example when it is right', () => {
    expect(
      run(`/**
 * @example
 * reynolds(1, 0.0266, 1.306e-6)  // ≈ 20368
 */`),
    ).toEqual([]);
  });

  it('checks a number to the digits written when no tolerance is given', () => {
    expect(writtenPrecision('0.0180')).toBeCloseTo(5e-5, 15);
    expect(writtenPrecision('8.95e-6')).toBeCloseTo(5e-9, 20);
    expect(writtenPrecision('76')).toBe(0.5);
    // Re = 20367.5: "20370" claims ±0.5, so it fails; "2.037e4" claims ±5, so it passes
    expect(run('/**\n * @example\n * reynolds(1, 0.0266, 1.306e-6)  // ≈ 20370\n */')).toHaveLength(1);
    expect(run('/**\n * @example\n * reynolds(1, 0.0266, 1.306e-6)  // ≈ 2.037e4\n */')).toEqual([]);
  });

  it('reports a wrong exact value, a missing throw and a wrong error', () => {
    const failures = run(`/**
 * @example
 * defaultSeries('pvc')  // → 'hdpe-dr11'
 * defaultSeries('pvc')  // throws EngineInputError
 * toSI(1, 'banana', 'length')  // throws RangeError
 * toSI(1, 'banana', 'length')  // throws EngineInputError
 */`);
    expect(failures.map((f) => f.line)).toEqual([3, 4, 5]);
  });

  it('reports a line with no marker, an unknown name, and an example with nothing checked', () => {
    expect(run('/**\n * @example\n * reynolds(1, 0.0266, 1.306e-6) = 20368\n */')[0]!.message).toMatch(/malformed/);
    expect(run('/**\n * @example\n * noSuchFunction(1)  // ≈ 1\n */')[0]!.message).toMatch(
      /noSuchFunction is not defined/,
    );
    expect(run('/**\n * @example\n * // only prose here\n */')[0]!.message).toMatch(/no checked line/);
    expect(
      run('/**\n * @example\n * reynolds(1, 0.0266, 1.306e-6)  // ≈ about twenty thousand\n */')[0]!.message,
    ).toMatch(/malformed/);
  });

  it('joins an expression over lines, runs setup lines and knows its owner', () => {
    const src = `/**
 * @example caption here
 * // prose is skipped
 * const d = 0.0266
 * reynolds(
 *   1, d, 1.306e-6,
 * )  // ≈ 20368
 * @see elsewhere
 */
export function owner() {}`;
    const [ex] = extractExamples(src, 'fake.ts');
    expect(ex!.owner).toBe('owner');
    expect(ex!.caption).toBe('caption here');
    expect(ex!.statements).toHaveLength(2);
    expect(runExample(ex!, scope)).toEqual([]);
    expect(docBlocks(src, 'fake.ts')[0]!.line).toBe(1);
  });
});
