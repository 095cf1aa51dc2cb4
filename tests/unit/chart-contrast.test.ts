import { describe, expect, it } from 'vitest';
import { contrastRatio, relativeLuminance } from '@/lib/charts/contrast';
import { CARD_BACKGROUND, TONES } from '@/components/charts/tones';
import { palette } from '@/tailwind.config';

/** '#rrggbb' of a Tailwind colour name such as 'creek-700' or 'clay-DEFAULT'. */
function hex(name: string): string {
  const [hue, shade] = name.split('-') as [keyof typeof palette, string];
  const value = (palette[hue] as Record<string, string> | undefined)?.[shade];
  if (!value) throw new Error(`no palette colour ${name}`);
  return value;
}

/** The light and dark colour one class string paints, e.g. 'stroke-clay-600 dark:stroke-clay-300'. */
function pair(classes: string, prop: string): { light: string; dark: string } {
  const light = new RegExp(`(?:^|\\s)${prop}-([a-z]+-\\w+?)(?:/\\d+)?(?=\\s|$)`).exec(classes)?.[1];
  const dark = new RegExp(`dark:${prop}-([a-z]+-\\w+?)(?:/\\d+)?(?=\\s|$)`).exec(classes)?.[1];
  if (!light || !dark) throw new Error(`"${classes}" lacks a light or dark ${prop}`);
  return { light, dark };
}

describe('WCAG 2.x contrast', () => {
  it('computes relative luminance and contrast as the definition does', () => {
    // WCAG 2.2, definition of "contrast ratio": black on white is 21:1, a colour on itself 1:1
    expect(contrastRatio('#000000', '#ffffff')).toBeCloseTo(21, 6);
    expect(contrastRatio('#1f3a3d', '#1f3a3d')).toBe(1);
    expect(relativeLuminance('#fff')).toBeCloseTo(1, 9);
    // #767676 on white is 4.54:1, the lightest grey that passes AA for text (from memory; WebAIM contrast checker)
    expect(contrastRatio('#767676', '#ffffff')).toBeCloseTo(4.54, 2);
    // #777777 on white falls just short at 4.48:1 (from memory; WebAIM contrast checker)
    expect(contrastRatio('#777777', '#ffffff')).toBeCloseTo(4.48, 2);
  });
});

describe('chart colours against the card, both themes', () => {
  const card = { light: hex(CARD_BACKGROUND.light), dark: hex(CARD_BACKGROUND.dark) };
  // WCAG 2.2 SC 1.4.3 (text 4.5:1) and SC 1.4.11 (graphical objects 3:1)
  const needs = { text: 4.5, mark: 3 } as const;

  for (const [name, tone] of Object.entries(TONES)) {
    if (tone.use === 'decoration') continue;
    const need = needs[tone.use];
    it(`${name} (${tone.use}) reaches ${need}:1 in light and dark`, () => {
      for (const prop of ['stroke', 'fill', 'text'] as const) {
        const classes = tone[prop];
        const { light, dark } = pair(classes, prop);
        expect(contrastRatio(hex(light), card.light), `${name} ${prop} light ${light}`).toBeGreaterThanOrEqual(need);
        expect(contrastRatio(hex(dark), card.dark), `${name} ${prop} dark ${dark}`).toBeGreaterThanOrEqual(need);
      }
    });
  }

  it('every tone names one colour for each theme, the same for stroke, fill and text', () => {
    for (const [name, tone] of Object.entries(TONES)) {
      const s = pair(tone.stroke, 'stroke');
      expect(pair(tone.fill, 'fill'), name).toEqual(s);
      expect(pair(tone.text, 'text'), name).toEqual(s);
    }
  });

  it('the caption under a chart (cw-muted: creek-500, creek-200 in dark) is legible text', () => {
    // app/globals.css .cw-muted
    expect(contrastRatio(hex('creek-500'), card.light)).toBeGreaterThanOrEqual(4.5);
    expect(contrastRatio(hex('creek-200'), card.dark)).toBeGreaterThanOrEqual(4.5);
  });

  it('the reader’s own point stands apart from everyone else’s', () => {
    // the reader's points are also larger and ringed; 2:1 between the two fills keeps them apart in grey too (common practice, no source)
    const mine = pair(TONES.mine.fill, 'fill');
    const others = pair(TONES.others.fill, 'fill');
    expect(contrastRatio(hex(mine.light), hex(others.light))).toBeGreaterThanOrEqual(2);
    expect(contrastRatio(hex(mine.dark), hex(others.dark))).toBeGreaterThanOrEqual(2);
  });
});
