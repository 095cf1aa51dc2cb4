/**
 * Every worked example in content/guides agrees with the engine, and every
 * calculator a guide embeds shows the figures its text quotes.
 *
 * A worked example carries an MDX comment (not rendered, see the last test) that
 * names a calculator, the props it runs on and the figures the text quotes:
 *
 *   {/* check: yield-estimate fall="4 ft" lift="29 ft" driveFlow="2 gal/min"
 *     deliveredFlowM3s = 290 mL/min in "about 290 mL a minute"
 *   *\/}
 *
 * Each figure line names a result path, the number and unit the guide writes,
 * and the words the guide prints it in. The test runs the calculator exactly as
 * the embedded card does (the registry, the card's defaults, metric display),
 * converts the result to the unit named, and accepts the written number when it
 * is the engine's value rounded to the digits written (420 stands for 415–425,
 * 1,500 for 1,450–1,550), or within an explicit `±n%`. The quoted words must
 * appear in the guide's text after the comment, before the next check (stacked
 * checks share the text after them all), so the
 * prose cannot change without the check seeing it. `check: engine` reads the
 * engine's rules of practice (and its table of drive flow by pump size) instead of a calculator. Every embedded calculator
 * must have a check with exactly its props, so the card and the text agree.
 *
 * The expected numbers are the guides' own; the reference is the engine, whose
 * values carry their sources in lib/hydraulics (efficiency: Building Trades
 * Pocketbook table; rules: lib/hydraulics/practice.ts).
 */
import { describe, expect, it } from 'vitest';
import { renderToStaticMarkup } from 'react-dom/server';
import {
  ARRAY_LIMITS,
  DRIVE_PIPE_GUIDES,
  NOMINAL_SIZES,
  PRACTICE,
  RATING_MARGIN,
  UNIT_CHOICES,
  fromSI,
  householdRate,
  livestockRates,
  typicalDriveFlow,
  type QuantityKind,
  type UnitSystem,
} from '@/lib/hydraulics';
import { CALCULATORS, computeForm, initialState, isCalculatorId } from '@/lib/calculators';
import { listGuides } from '@/lib/guides/content';
import { renderGuide } from '@/components/guides/GuideBody';

interface Figure {
  path: string;
  written: string;
  unit: string;
  tolerancePct?: number;
  quote: string;
}

interface Check {
  calc: string;
  props: Record<string, string>;
  figures: Figure[];
  /** the guide's text from this check to the next one, comments removed */
  after: string;
}

const CHECK_RE = /\{\/\*\s*check:([\s\S]*?)\*\/\}/g;
const PROP_RE = /([A-Za-z]+)="([^"]*)"/g;
const FIGURE_RE = /^\s*([\w.\-[\]]+)\s*=\s*([\d,]*\.?\d+)\s*([^\s"±]*)\s*(?:±\s*([\d.]+)%)?\s+in\s+"([^"]+)"\s*$/;

function stripComments(text: string): string {
  return text.replace(/\{\/\*[\s\S]*?\*\/\}/g, '');
}

export function parseChecks(body: string): Check[] {
  const matches = [...body.matchAll(CHECK_RE)];
  return matches.map((m, i) => {
    const inner = m[1] ?? '';
    const [head = '', ...lines] = inner.split('\n');
    const calc = head.trim().split(/\s+/)[0] ?? '';
    const headProps = head.trim().slice(calc.length);
    const props: Record<string, string> = {};
    for (const p of headProps.matchAll(PROP_RE)) props[p[1]!] = p[2]!;
    const figures: Figure[] = [];
    for (const line of lines) {
      if (line.trim() === '') continue;
      const f = FIGURE_RE.exec(line);
      if (!f) throw new Error(`check line does not parse: ${line.trim()}`);
      figures.push({
        path: f[1]!,
        written: f[2]!,
        unit: f[3] ?? '',
        tolerancePct: f[4] === undefined ? undefined : Number(f[4]),
        quote: f[5]!,
      });
    }
    // Checks stacked one after another share the text that follows them all.
    let j = i + 1;
    while (
      j < matches.length &&
      body.slice(matches[j - 1]!.index! + matches[j - 1]![0].length, matches[j]!.index).trim() === ''
    )
      j++;
    const end = matches[j]?.index ?? body.length;
    const after = stripComments(body.slice((m.index ?? 0) + m[0].length, end));
    return { calc, props, figures, after };
  });
}

/** Half a unit of the last significant digit written: 420 → 5, 1,500 → 50, 0.29 → 0.005, 7.25 → 0.005. */
export function roundingTolerance(written: string): number {
  const t = written.replace(/,/g, '');
  const dot = t.indexOf('.');
  if (dot >= 0) return 0.5 * 10 ** -(t.length - dot - 1);
  const zeros = /0*$/.exec(t)?.[0].length ?? 0;
  return 0.5 * 10 ** Math.min(zeros, t.length - 1);
}

function resultsOf(check: Check, system: UnitSystem): unknown {
  if (check.calc === 'engine')
    return {
      PRACTICE,
      DRIVE_PIPE_GUIDES,
      ARRAY_LIMITS,
      RATING_MARGIN,
      household: householdRate(),
      livestock: livestockRates(),
      // keyed 1_2, 1-1_4, …: a path is split on dots and takes no slash
      pumpSizes: Object.fromEntries(NOMINAL_SIZES.map((s) => [s.replace('/', '_'), typicalDriveFlow(s)])),
    };
  if (!isCalculatorId(check.calc)) throw new Error(`unknown calculator ${check.calc}`);
  const def = CALCULATORS[check.calc];
  const state = initialState(def.fields, check.props, def.defaults, system);
  const out = computeForm(def as never, state);
  if (!out.ok) throw new Error(`${check.calc} refused ${JSON.stringify(check.props)}: ${JSON.stringify(out)}`);
  return out.output.results;
}

function valueAt(root: unknown, path: string): number {
  let v: unknown = root;
  for (const key of path.split('.')) {
    if (v === null || typeof v !== 'object') throw new Error(`no ${path}`);
    v = (v as Record<string, unknown>)[key];
  }
  if (typeof v !== 'number') throw new Error(`${path} is not a number (${String(v)})`);
  return v;
}

/** SI → the unit the guide writes. '%' is a share shown in per cent; '' is a plain number. */
export function inUnit(si: number, unit: string): number {
  if (unit === '') return si;
  if (unit === '%') return si * 100;
  // The unit picks its kind: L/day only measures a daily volume, whose SI is m³/day, not m³/s.
  const qty = (Object.keys(UNIT_CHOICES) as QuantityKind[]).find((k) => UNIT_CHOICES[k].includes(unit));
  if (!qty) throw new Error(`unknown unit ${unit}`);
  return fromSI(si, unit, qty);
}

const guides = listGuides();

describe('guides agree with the engine', () => {
  it('finds worked-example checks in the guides', () => {
    const total = guides.reduce((n, g) => n + parseChecks(g.source).length, 0);
    expect(total).toBeGreaterThanOrEqual(50);
  });

  for (const g of guides) {
    const checks = parseChecks(g.source);
    // a card opens on the reader's unit system (a metric reader's unnamed pipe is a metric one), so both must agree
    it.each(['US', 'metric'] as const)(`${g.slug}: every quoted figure is the engine's (%s reader)`, (system) => {
      for (const c of checks) {
        const results = resultsOf(c, system);
        for (const f of c.figures) {
          const where = `${g.slug} (${system}) ${c.calc} ${f.path} "${f.quote}"`;
          const engine = inUnit(valueAt(results, f.path), f.unit);
          const written = Number(f.written.replace(/,/g, ''));
          const tol =
            f.tolerancePct === undefined ? roundingTolerance(f.written) : (Math.abs(engine) * f.tolerancePct) / 100;
          expect(Math.abs(engine - written), `${where}: engine gives ${engine}`).toBeLessThanOrEqual(tol + 1e-12);
          expect(f.quote, `${where}: the quote must contain the number written`).toContain(f.written);
          expect(c.after, `${where}: the guide no longer says this`).toContain(f.quote);
        }
      }
    });

    it(`${g.slug}: every embedded calculator has a check with its exact props`, () => {
      const tags = [
        ...stripComments(g.source).matchAll(/^<([A-Z][A-Za-z]+)((?:\s+[A-Za-z]+="[^"]*")*)\s*\/>/gm),
      ].filter((t) => t[1] !== 'Caution' && t[1] !== 'RamDiagram' && t[1] !== 'U'); // cautions, drawings and unit pairs run no calculator
      for (const t of tags) {
        const id = t[1]!.replace(/[A-Z]/g, (c, i: number) => (i === 0 ? c.toLowerCase() : `-${c.toLowerCase()}`));
        const props: Record<string, string> = {};
        for (const p of (t[2] ?? '').matchAll(PROP_RE)) props[p[1]!] = p[2]!;
        const match = checks.some((c) => c.calc === id && JSON.stringify(c.props) === JSON.stringify(props));
        expect(match, `${g.slug}: <${t[1]}${t[2]} /> has no check with the same props`).toBe(true);
      }
    });
  }

  it('reads a figure that disagrees as a failure', () => {
    const body =
      '{/* check: yield-estimate fall="4 ft" lift="29 ft" driveFlow="2 gal/min"\n  deliveredFlowM3s = 537 mL/min in "537 mL"\n*/}\nIt delivers 537 mL a minute.';
    const [c] = parseChecks(body);
    const engine = inUnit(valueAt(resultsOf(c!, 'US'), 'deliveredFlowM3s'), 'mL/min');
    // 537 mL/min was the old figure at efficiency 0.6; the sourced typical band gives far less.
    expect(Math.abs(engine - 537)).toBeGreaterThan(roundingTolerance('537'));
  });

  it('the rounding rule reads the digits a person writes', () => {
    // common practice, no source: a written figure stands for its last significant digit
    expect(roundingTolerance('420')).toBe(5);
    expect(roundingTolerance('1,500')).toBe(50);
    expect(roundingTolerance('0.29')).toBeCloseTo(0.005);
    expect(roundingTolerance('7')).toBe(0.5);
  });

  it('leaves the check comments out of the page and out of the text search indexes', async () => {
    const g = guides.find((x) => parseChecks(x.source).length > 0)!;
    // next-mdx-remote drops MDX comments itself; the body the page renders has none to begin with.
    const html = renderToStaticMarkup((await renderGuide(g.source)).content);
    expect(html).not.toContain('check:');
    expect(html).not.toContain(' in "');
    expect(g.body).not.toContain('check:');
    expect(parseChecks(g.body)).toEqual([]);
  }, 30_000);
});
