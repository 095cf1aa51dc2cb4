/**
 * A guide is built once for every reader and carries both unit systems; CSS shows the
 * reader's (components/guides/ForUnits.tsx, app/globals.css). Here each guide is read
 * as each reader sees it, the other system's parts removed as the CSS removes them,
 * and no quantity of the other system may be left (issue 20: every number a reader
 * sees is in the reader's units).
 *
 * Excused in both: pipe sold under an inch name, written as a trade size ("¾-inch
 * HDPE", "1-inch DR11"). The embedded calculators are left out: they follow the
 * reader's cookie themselves once hydrated (components/calculators).
 */
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { Window } from 'happy-dom';
import { describe, expect, it } from 'vitest';
import { renderToStaticMarkup } from 'react-dom/server';
import { renderGuide } from '@/components/guides/GuideBody';
import { ForUnits, U } from '@/components/guides/ForUnits';
import { listGuides } from '@/lib/guides/content';
import { UNITS_FIRST_PAINT_SCRIPT } from '@/lib/units/first-paint';
import { mdxToText } from '@/lib/search/documents';

type System = 'US' | 'metric';
const other = (s: System): System => (s === 'US' ? 'metric' : 'US');

/** The text a reader of `system` sees: the other system's parts gone, as display:none removes them. */
function seenBy(html: string, system: System): string {
  const doc = new Window().document;
  doc.write(`<!doctype html><html data-units="${system}"><body>${html}</body></html>`);
  for (const sel of [`[data-units-only="${other(system)}"]`, '[data-calculator]', '.katex-mathml'])
    doc.querySelectorAll(sel).forEach((el) => el.remove());
  return (doc.body.textContent ?? '').replace(/\s+/g, ' ');
}

const TRADE_SIZE = /(?:\d+[¼½¾]?|[¼½¾])-inch\b/g;
// a number and then a unit of one system (the writing conventions of NIST SP 811, 2008, and common US usage)
const US_ONLY =
  /(?:\d|[¼½¾])[\s-]*(?:ft|in|inch|inches|feet|foot|yd|yards?|mi|miles?|psi|gal|gallons?|US gal|US cups?|lb|°F|ft²|ft³|″)(?![A-Za-z])|\bpsi\b|\bUS gal\b/;
const METRIC_ONLY =
  /(?:\d|[¼½¾])[\s-]*(?:mm|cm|m|km|m²|m³|L|mL|kPa|MPa|bar|kg|°C|metres?|litres?)(?![A-Za-z])|\bkPa\b|\bcentimetres?\b|\bmillimetres?\b/;
const FORBIDDEN: Record<System, RegExp> = { US: METRIC_ONLY, metric: US_ONLY };

/** Each match with a little context, so a failure says where. */
function offending(text: string, system: System): string[] {
  const t = text.replace(TRADE_SIZE, 'TRADE-SIZE');
  const re = new RegExp(FORBIDDEN[system].source, 'g');
  return [...t.matchAll(re)].map((m) => t.slice(Math.max(0, m.index - 40), m.index + m[0].length + 10));
}

describe('guides in the reader’s units', () => {
  it('U and ForUnits render both systems, each marked for its reader', () => {
    const html = renderToStaticMarkup(
      <p>
        The gauge reads <U us="12.6 psi" metric="87 kPa" />.
        <ForUnits system="metric">
          <span>0.29 L/min</span>
        </ForUnits>
      </p>,
    );
    expect(seenBy(html, 'US')).toBe('The gauge reads 12.6 psi.');
    expect(seenBy(html, 'metric')).toBe('The gauge reads 87 kPa.0.29 L/min');
    expect(() => renderToStaticMarkup(<ForUnits system="imperial">x</ForUnits>)).toThrow(/US.*metric/);
  });

  it('the check finds a unit of the other system, and excuses trade pipe sizes', () => {
    expect(offending('lift 29 ft (8.8 m)', 'US')).toHaveLength(1);
    expect(offending('lift 29 ft (8.8 m)', 'metric')).toHaveLength(1);
    expect(offending('about 0.58 L/min through ¾-inch HDPE and a 1-inch line', 'metric')).toEqual([]);
    expect(offending('12.6 psi', 'metric')).toHaveLength(1);
    expect(offending('a 1-litre jug', 'US')).toHaveLength(1);
    expect(offending('in the morning, 5 min later, 10 s', 'metric')).toEqual([]);
  });

  it('the page hides the other system before paint, from the cookie, with display:none', () => {
    const css = readFileSync(path.join(process.cwd(), 'app/globals.css'), 'utf8');
    expect(css).toMatch(
      /html\[data-units='metric'\] \[data-units-only='US'\],\s*html:not\(\[data-units='metric'\]\) \[data-units-only='metric'\] \{\s*display: none;/,
    );
    for (const [cookie, want] of [
      ['cw_units=metric', 'metric'],
      ['a=1; cw_units=metric', 'metric'],
      ['cw_units=US', 'US'],
      ['cw_units=metrical', 'US'],
      ['', 'US'],
    ] as const) {
      const { document } = new Window({ url: 'http://127.0.0.1/' });
      for (const c of cookie.split('; ').filter(Boolean)) document.cookie = c;
      // the script reads only `document`, handed in here as the page's own
      new Function('document', UNITS_FIRST_PAINT_SCRIPT)(document);
      expect(document.documentElement.getAttribute('data-units'), cookie).toBe(want);
    }
  });

  it('search indexes one system, the default, so a snippet has no holes and no number twice', () => {
    const text = mdxToText(
      'With <U us="29 ft" metric="8.84 m" /> of lift.\n\n<ForUnits system="US">\n\nq ≈ 0.08 US gal/min\n\n</ForUnits>\n\n<ForUnits system="metric">\n\nq ≈ 0.29 L/min\n\n</ForUnits>',
    );
    expect(text).toContain('With 29 ft of lift.');
    expect(text).toContain('0.08 US gal/min');
    expect(text).not.toMatch(/8\.84|0\.29/);
  });

  for (const g of listGuides()) {
    it.each(['US', 'metric'] as const)(
      `${g.slug}: a %s reader sees only their own units`,
      async (system) => {
        const html = renderToStaticMarkup((await renderGuide(g.body)).content);
        const text = seenBy(html, system);
        expect(offending(text, system), `${g.slug} (${system})`).toEqual([]);
        expect(text, `${g.slug} (${system}) uses e-notation`).not.toMatch(/\d[eE][+-]?\d/);
        // TeX left in a prop string is not typeset: the reader would see the dollar signs
        expect(text, `${g.slug} (${system}) shows raw TeX`).not.toMatch(/\$/);
      },
      30_000,
    );
  }
});
