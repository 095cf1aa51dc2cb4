import { describe, expect, it } from 'vitest';
import { renderToStaticMarkup } from 'react-dom/server';
import { renderGuide } from '@/components/guides/GuideBody';
import { readGuideFile } from '@/lib/guides/content';
import { CALCULATORS, initialState, type CalculatorId } from '@/lib/calculators';
import { SiteSketchDrawing } from '@/components/calculators/kit/SiteSketch';
import { AREA, LINE, PAPER, TEXT } from '@/components/drawing-colours';
import { palette } from '@/tailwind.config';

const PARTS = ['drive pipe', 'waste valve', 'delivery valve', 'air chamber', 'snifter', 'delivery line'];

describe('the ram diagram in "How a ram pump works"', () => {
  it('draws the parts and the four phases of a beat, each beside its steps, labelled in words', async () => {
    const guide = readGuideFile('how-a-ram-pump-works');
    if (!guide) throw new Error('guide missing');
    const html = renderToStaticMarkup((await renderGuide(guide.body)).content);
    const figures = [...html.matchAll(/<figure[^>]*data-ram-diagram="([^"]+)"[\s\S]*?<\/figure>/g)];
    expect(figures.map((f) => f[1])).toEqual(['parts', '1', '2', '3', '4']);
    for (const [figure, phase] of figures) {
      expect(figure, phase).toMatch(
        /<svg[^>]*role="img"[^>]*aria-labelledby="ram-[\w]+-title" aria-describedby="ram-[\w]+-desc"/,
      );
      expect(figure, phase).toMatch(
        /<title id="ram-[\w]+-title">[^<]+<\/title><desc id="ram-[\w]+-desc">[^<]+<\/desc>/,
      );
      // each part labelled in the drawing's own text, so nothing is told by colour alone
      // (the valve's label wraps onto two lines)
      const labels = [...figure.matchAll(/<text[^>]*>([^<]*)<\/text>/g)].map((t) => t[1]!.trim()).join(' ');
      for (const part of PARTS) expect(labels, `${phase} labels ${part}`).toContain(part);
    }
    // each phase comes after the step it draws and before the next step's heading
    const at = (s: string) => html.indexOf(s);
    expect(at('data-ram-diagram="parts"')).toBeLessThan(at('id="one-beat-step-by-step"'));
    expect(at('data-ram-diagram="1"')).toBeGreaterThan(at('id="1-drive-water-accelerates"'));
    expect(at('data-ram-diagram="1"')).toBeLessThan(at('id="2-the-waste-valve-slams-shut"'));
    expect(at('data-ram-diagram="2"')).toBeLessThan(at('id="3-pressure-rises"'));
    expect(at('data-ram-diagram="3"')).toBeGreaterThan(at('id="4-the-delivery-valve-opens"'));
    expect(at('data-ram-diagram="4"')).toBeGreaterThan(at('id="8-the-waste-valve-reopens"'));
    expect(at('data-ram-diagram="4"')).toBeLessThan(at('id="beats-per-minute-and-stroke"'));
  });
});

/** The sketch as the card draws it for a calculator's form, with some fields as typed. */
function sketch(id: CalculatorId, units: 'US' | 'metric', props: Record<string, string> = {}) {
  const def = CALCULATORS[id];
  const state = initialState(def.fields, props, def.defaults, units);
  const html = renderToStaticMarkup(<SiteSketchDrawing fields={def.fields} state={state} units={units} />);
  const label = /aria-label="([^"]*)"/.exec(html)?.[1] ?? '';
  const part = (name: string) =>
    new RegExp(`<text[^>]*data-sketch-part="${name}"[^>]*>([\\s\\S]*?)</text>`)
      .exec(html)?.[1]
      ?.replace(/<[^>]+>/g, ' ')
      .replace(/\s+/g, ' ')
      .trim();
  return { html, label, part };
}

describe('the site sketch on the calculators', () => {
  const site = { fall: '4 ft', lift: '29 ft', driveLength: '24 ft', deliveryLength: '150 ft' };

  it('labels fall, lift, drive pipe and delivery line with the form’s values in US units', () => {
    const s = sketch('array-planner', 'US', site);
    // the values as typed, in feet: nothing to convert
    expect([s.part('fall'), s.part('drive'), s.part('lift'), s.part('delivery')]).toEqual([
      'fall 4 ft',
      'drive pipe 24 ft',
      'lift 29 ft',
      'delivery line 150 ft',
    ]);
    expect(s.html).toMatch(/<svg[^>]*role="img"/);
    expect(s.label).toContain('fall 4 ft from the source’s surface down to the pump');
    expect(s.label).toContain('delivery line 150 ft from the pump up to the tank');
  });

  it('shows the same site in metric', () => {
    const s = sketch('array-planner', 'metric', site);
    // 1 ft = 0.3048 m exactly (NIST SP 811, 2008, appendix B): 4 ft = 1.2192 m, 24 ft = 7.3152 m,
    // 29 ft = 8.8392 m, 150 ft = 45.72 m, to three significant figures
    expect([s.part('fall'), s.part('drive'), s.part('lift'), s.part('delivery')]).toEqual([
      'fall 1.22 m',
      'drive pipe 7.32 m',
      'lift 8.84 m',
      'delivery line 45.7 m',
    ]);
    expect(s.label).toContain('lift 8.84 m from the pump up to the outlet at the tank');
  });

  it('follows the reader’s units whatever unit a value was typed in', () => {
    // 1.5 m ÷ 0.3048 m/ft = 4.921 ft (NIST SP 811, 2008, appendix B)
    expect(sketch('yield-estimate', 'US', { fall: '1.5 m' }).part('fall')).toBe('fall 4.92 ft');
    // 1,200 ft × 0.3048 = 365.76 m (NIST SP 811, 2008, appendix B)
    expect(sketch('array-planner', 'metric', { deliveryLength: '1200 ft' }).part('delivery')).toBe(
      'delivery line 366 m',
    );
  });

  it('keeps plain labels for a value that is missing, unreadable or not asked for', () => {
    const yieldSketch = sketch('yield-estimate', 'US', { fall: '' });
    expect(yieldSketch.part('fall')).toBe('fall');
    // the yield estimate asks for no pipe lengths
    expect(yieldSketch.part('drive')).toBe('drive pipe');
    expect(yieldSketch.part('delivery')).toBe('delivery line');
    expect(yieldSketch.label).toMatch(/^Site sketch: fall from the source’s surface/);
    expect(sketch('drive-pipe-check', 'US', { fall: 'four' }).part('fall')).toBe('fall');
    expect(sketch('delivery-line', 'US').part('lift')).toBe('lift 29 ft');
    // the stall check's delivery line is optional and starts empty, but is asked for
    expect(sketch('stall-check', 'US').part('delivery')).toBe('delivery line');
    expect(sketch('stall-check', 'metric', { deliveryLength: '150 ft' }).part('delivery')).toBe('delivery line 45.7 m');
  });

  it('is drawn only for calculators that ask for a fall, lift or pipe length', () => {
    const drawn = (Object.keys(CALCULATORS) as CalculatorId[]).filter((id) => sketch(id, 'US').html !== '');
    expect(drawn.sort()).toEqual([
      'array-planner',
      'delivery-line',
      'drive-pipe-check',
      'stall-check',
      'yield-estimate',
    ]);
  });
});

/** A class pair such as 'stroke-creek-700 dark:stroke-limestone-200' as its two hex colours. */
function hexes(classes: string): { light: string; dark: string } {
  const pick = (c: string | undefined) => {
    const [, hue, shade] = /^(?:dark:)?(?:stroke|fill|bg)-([a-z]+)-(\d+)$/.exec(c ?? '') ?? [];
    const hex = (palette as Record<string, Record<string, string>>)[hue ?? '']?.[shade ?? ''];
    if (!hex) throw new Error(`not a palette colour: ${c}`);
    return hex;
  };
  const parts = classes.split(/\s+/);
  return {
    light: pick(parts.find((c) => !c.startsWith('dark:'))),
    dark: pick(parts.find((c) => c.startsWith('dark:'))),
  };
}

/** Contrast ratio as WCAG 2.1 defines it (relative luminance, sRGB; W3C, 2018, "contrast ratio"). */
function contrast(a: string, b: string): number {
  const lum = (hex: string) => {
    const [r, g, bl] = [1, 3, 5].map((i) => {
      const c = parseInt(hex.slice(i, i + 2), 16) / 255;
      return c <= 0.03928 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4;
    });
    return 0.2126 * r! + 0.7152 * g! + 0.0722 * bl!;
  };
  const [hi, lo] = [lum(a), lum(b)].sort((x, y) => y - x);
  return (hi! + 0.05) / (lo! + 0.05);
}

describe('the drawings’ colours', () => {
  it('contrast against the paper and the water in both themes', () => {
    // WCAG 2.1: 3:1 for graphical objects (1.4.11), 4.5:1 for text (1.4.3)
    // black on white is 21:1 (WCAG 2.1, the formula's own end point), a check of the formula
    expect(contrast('#000000', '#ffffff')).toBeCloseTo(21, 6);
    const grounds = [PAPER, AREA.water].map(hexes);
    for (const [need, set] of [
      [3, LINE],
      [4.5, TEXT],
    ] as const) {
      for (const [name, classes] of Object.entries(set)) {
        const c = hexes(classes);
        for (const g of grounds) {
          expect(contrast(c.light, g.light), `${name} light on ${g.light}`).toBeGreaterThanOrEqual(need);
          expect(contrast(c.dark, g.dark), `${name} dark on ${g.dark}`).toBeGreaterThanOrEqual(need);
        }
      }
    }
  });
});
