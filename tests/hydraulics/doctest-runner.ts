/**
 * Doctests for the engine: extracts the `@example` blocks from the doc
 * comments in lib/hydraulics and runs them.
 *
 * Syntax, inside a JSDoc comment (see DEVELOPERS.md, "Calculators"):
 *
 *   @example optional caption
 *   // prose: a line that is only a comment is read, not run
 *   const p = resolvePipe('pvc-sch40', '1')          setup, visible to later lines
 *   reynolds(1, 0.0266, 1.306e-6)  // ≈ 20368           to the digits written (± half the last digit)
 *   boreArea(0.0158)               // ≈ 1.960e-4 ±0.1%  relative tolerance
 *   colebrook(1e5, 0)              // ≈ 0.0180 ±0.0002  absolute tolerance
 *   defaultSeries('pvc')           // → 'pvc-sch40'      exact (deep) equality with a JS literal
 *   toSI(1, 'banana', 'length')    // throws EngineInputError
 *
 * An expression may run over several lines while a bracket is open. The
 * example block ends at the next `@tag` or the end of the comment. Every
 * expression line must carry one of the three markers; anything else is
 * reported as malformed, so a typo cannot make an example silently pass.
 * Names in scope: everything the comment's own module exports, plus the
 * public engine API (lib/hydraulics/index.ts).
 */
import { isDeepStrictEqual, inspect } from 'node:util';

export interface Expectation {
  kind: 'approx' | 'exact' | 'throws';
  /** the expression to evaluate */
  code: string;
  /** approx: the number; exact: the literal's source; throws: the error name */
  expected: string;
  /** approx: absolute tolerance (after resolving % and written digits) */
  tolerance?: { abs?: number; rel?: number };
  line: number;
}

export interface Statement {
  setup?: string;
  expectation?: Expectation;
  line: number;
}

export interface Example {
  file: string;
  /** line of the `@example` tag */
  line: number;
  caption: string;
  /** the declaration the comment documents (function or const name), if any */
  owner?: string;
  statements: Statement[];
  /** lines that could not be read (reported as failures) */
  malformed: { line: number; text: string; why: string }[];
}

export interface Failure {
  line: number;
  code: string;
  message: string;
}

export interface DocBlock {
  file: string;
  line: number;
  owner?: string;
  text: string[];
}

/** Every JSDoc block of a source file, with the name of what follows it. */
export function docBlocks(source: string, file: string): DocBlock[] {
  const blocks: DocBlock[] = [];
  const re = /\/\*\*([\s\S]*?)\*\//g;
  let m: RegExpExecArray | null;
  while ((m = re.exec(source))) {
    const start = source.slice(0, m.index).split('\n').length;
    const body = m[1] ?? '';
    const text = body.split('\n').map((l) => l.replace(/^\s*\* ?/, ''));
    const after = source.slice(m.index + m[0].length);
    const decl =
      /^\s*export\s+(?:async\s+)?(?:function\s*\*?\s*|const\s+|let\s+|class\s+|interface\s+|type\s+)([A-Za-z_$][\w$]*)/.exec(
        after,
      );
    blocks.push({ file, line: start, owner: decl?.[1], text });
  }
  return blocks;
}

const APPROX = /^(.*?)\/\/\s*≈\s*(.+)$/s;
const EXACT = /^(.*?)\/\/\s*→\s*(.+)$/s;
const THROWS = /^(.*?)\/\/\s*throws\s+([A-Za-z_$][\w$]*)\s*$/s;

/** Half a unit in the last digit written: "0.0180" → 5e-5, "8.95e-6" → 5e-9, "76" → 0.5. */
export function writtenPrecision(text: string): number {
  const m = /^[+-]?(\d+)(?:\.(\d+))?(?:e([+-]?\d+))?$/i.exec(text);
  if (!m) throw new Error(`not a plain number: ${text}`);
  const decimals = m[2]?.length ?? 0;
  const exp = m[3] ? Number(m[3]) : 0;
  return 0.5 * 10 ** (exp - decimals);
}

function parseApprox(rest: string): { value: number; tolerance: { abs?: number; rel?: number } } | string {
  const m = /^([+-]?[\d,]*\.?\d+(?:e[+-]?\d+)?)(?:\s*±\s*([\d.]+(?:e[+-]?\d+)?)\s*(%)?)?\s*$/i.exec(rest.trim());
  if (!m || m[1] === undefined) return `"${rest.trim()}" is not a number with an optional ±tolerance`;
  const written = m[1].replace(/,/g, '');
  const value = Number(written);
  if (!Number.isFinite(value)) return `"${m[1]}" is not a finite number`;
  if (m[2] === undefined) return { value, tolerance: { abs: writtenPrecision(written) } };
  const t = Number(m[2]);
  return { value, tolerance: m[3] ? { rel: t / 100 } : { abs: t } };
}

/** Counts open brackets outside string literals, to join a multi-line expression. */
function bracketDepth(code: string): number {
  let depth = 0;
  let quote: string | undefined;
  for (let i = 0; i < code.length; i++) {
    const c = code[i];
    if (quote) {
      if (c === '\\') i++;
      else if (c === quote) quote = undefined;
      continue;
    }
    if (c === '/' && code[i + 1] === '/') break;
    if (c === "'" || c === '"' || c === '`') quote = c;
    else if (c === '(' || c === '[' || c === '{') depth++;
    else if (c === ')' || c === ']' || c === '}') depth--;
  }
  return depth;
}

/** Reads the `@example` blocks of one doc block. */
export function examplesOf(block: DocBlock): Example[] {
  const out: Example[] = [];
  let current: Example | undefined;
  let pending: { text: string; line: number; depth: number } | undefined;
  const flush = (ex: Example) => {
    if (pending) {
      ex.malformed.push({ line: pending.line, text: pending.text, why: 'unclosed bracket' });
      pending = undefined;
    }
  };
  block.text.forEach((raw, i) => {
    const lineNo = block.line + i;
    const tag = /^\s*@(\w+)\s*(.*)$/.exec(raw);
    if (tag) {
      if (current) {
        flush(current);
        out.push(current);
        current = undefined;
      }
      if (tag[1] === 'example') {
        current = {
          file: block.file,
          line: lineNo,
          caption: (tag[2] ?? '').trim(),
          owner: block.owner,
          statements: [],
          malformed: [],
        };
      }
      return;
    }
    if (!current) return;
    const text = raw.trim();
    if (!pending && (text === '' || text.startsWith('//'))) return;
    const joined = pending ? `${pending.text}\n${text}` : text;
    const depth = bracketDepth(joined);
    if (depth > 0) {
      pending = { text: joined, line: pending?.line ?? lineNo, depth };
      return;
    }
    const at = pending?.line ?? lineNo;
    pending = undefined;
    current.statements.push(...readStatement(joined, at, current));
  });
  if (current) {
    flush(current);
    out.push(current);
  }
  return out;
}

function readStatement(text: string, line: number, ex: Example): Statement[] {
  let m = THROWS.exec(text);
  if (m) return [{ line, expectation: { kind: 'throws', code: (m[1] ?? '').trim(), expected: m[2] ?? '', line } }];
  m = EXACT.exec(text);
  if (m)
    return [{ line, expectation: { kind: 'exact', code: (m[1] ?? '').trim(), expected: (m[2] ?? '').trim(), line } }];
  m = APPROX.exec(text);
  if (m) {
    const a = parseApprox(m[2] ?? '');
    if (typeof a === 'string') {
      ex.malformed.push({ line, text, why: a });
      return [];
    }
    return [
      {
        line,
        expectation: {
          kind: 'approx',
          code: (m[1] ?? '').trim(),
          expected: String(a.value),
          tolerance: a.tolerance,
          line,
        },
      },
    ];
  }
  if (/^(const|let)\s/.test(text)) return [{ line, setup: text.replace(/;?\s*$/, ';') }];
  ex.malformed.push({ line, text, why: 'an expression needs "// ≈ value", "// → value" or "// throws Name"' });
  return [];
}

/** All examples in a source file. */
export function extractExamples(source: string, file: string): Example[] {
  return docBlocks(source, file).flatMap(examplesOf);
}

const IDENT = /^[A-Za-z_$][\w$]*$/;

/** Runs one example with `scope` (exported names → values) and returns what disagreed. */
export function runExample(ex: Example, scope: Record<string, unknown>): Failure[] {
  const failures: Failure[] = ex.malformed.map((m) => ({
    line: m.line,
    code: m.text,
    message: `malformed example line: ${m.why}`,
  }));
  if (ex.statements.every((s) => !s.expectation)) {
    failures.push({ line: ex.line, code: '', message: 'example has no checked line' });
  }
  const names = Object.keys(scope).filter((n) => IDENT.test(n));
  const values = names.map((n) => scope[n]);
  const checks: ((value: unknown) => void)[] = [];
  let body = '';
  ex.statements.forEach((s) => {
    if (s.setup) {
      body += `${s.setup}\n`;
      return;
    }
    const e = s.expectation!;
    const i = checks.length;
    checks.push((outcome) => {
      const r = outcome as { ok: boolean; value?: unknown; error?: unknown; expected?: unknown };
      const fail = (message: string) => failures.push({ line: e.line, code: e.code, message });
      if (e.kind === 'throws') {
        if (r.ok) fail(`expected it to throw ${e.expected}, got ${inspect(r.value)}`);
        else if (
          !(r.error instanceof Error) ||
          (r.error.name !== e.expected && r.error.constructor.name !== e.expected)
        ) {
          fail(`expected ${e.expected}, it threw ${inspect(r.error)}`);
        }
        return;
      }
      if (!r.ok) {
        fail(`threw ${r.error instanceof Error ? `${r.error.name}: ${r.error.message}` : inspect(r.error)}`);
        return;
      }
      if (e.kind === 'exact') {
        if (!isDeepStrictEqual(r.value, r.expected)) fail(`expected ${e.expected}, got ${inspect(r.value)}`);
        return;
      }
      const want = Number(e.expected);
      const got = r.value;
      if (typeof got !== 'number' || !Number.isFinite(got)) {
        fail(`expected a number ≈ ${e.expected}, got ${inspect(got)}`);
        return;
      }
      const tol = e.tolerance?.rel !== undefined ? e.tolerance.rel * Math.abs(want) : (e.tolerance?.abs ?? 0);
      if (Math.abs(got - want) > tol * (1 + 1e-12)) {
        const rel = want !== 0 ? ` (${(((got - want) / want) * 100).toPrecision(3)} %)` : '';
        fail(`expected ≈ ${e.expected} ± ${tol.toPrecision(3)}, got ${got.toPrecision(10)}${rel}`);
      }
    });
    const expectedCode = e.kind === 'exact' ? `, expected: (${e.expected})` : '';
    body += `try { __report[${i}]({ ok: true, value: (${e.code})${expectedCode} }); } catch (error) { __report[${i}]({ ok: false, error }); }\n`;
  });
  try {
    // The examples are our own doc comments, read from the repository.
    new Function(...names, '__report', body)(...values, checks);
  } catch (error) {
    failures.push({
      line: ex.line,
      code: '',
      message: `example does not run: ${error instanceof Error ? error.message : String(error)}`,
    });
  }
  return failures;
}
