import { describe, expect, it } from 'vitest';
import { palette } from '@/tailwind.config';
import { BEYOND_BADGE, BEYOND_BOX, LOOK } from '@/components/calculators/kit/VerdictLine';

/** WCAG 2.2 relative luminance of an sRGB hex colour (W3C, WCAG 2.2, definition "relative luminance"). */
function luminance(hex: string): number {
  const [r, g, b] = [1, 3, 5]
    .map((i) => parseInt(hex.slice(i, i + 2), 16) / 255)
    .map((v) => (v <= 0.04045 ? v / 12.92 : ((v + 0.055) / 1.055) ** 2.4)) as [number, number, number];
  return 0.2126 * r + 0.7152 * g + 0.0722 * b;
}
const ratio = (a: string, b: string) => {
  const [x, y] = [luminance(a), luminance(b)].sort((p, q) => q - p) as [number, number];
  return (x + 0.05) / (y + 0.05);
};
function colour(name: string): string {
  const [hue, shade = 'DEFAULT'] = name.split('-');
  const c = (palette as unknown as Record<string, Record<string, string>>)[hue!]?.[shade];
  if (!c) throw new Error(`no colour ${name}`);
  return c;
}
/** The text and background colours a class list sets, in the light or the dark theme. */
function pair(classes: string, dark: boolean): [string, string] {
  const prefix = dark ? 'dark:' : '';
  const pick = (kind: 'text' | 'bg') => {
    const m = classes.split(/\s+/).find((c) => c.startsWith(`${prefix}${kind}-`) && (dark || !c.includes(':')));
    if (!m) throw new Error(`no ${prefix}${kind} in ${classes}`);
    return colour(m.slice(prefix.length + kind.length + 1));
  };
  return [pick('text'), pick('bg')];
}

describe('verdict colours', () => {
  const boxes = { ...Object.fromEntries(Object.entries(LOOK).map(([k, v]) => [k, v.box])), beyond: BEYOND_BOX };
  for (const [name, classes] of Object.entries({ ...boxes, badge: BEYOND_BADGE }))
    for (const dark of [false, true])
      it(`${name} text is at least 4.5:1 on its background, ${dark ? 'dark' : 'light'}`, () => {
        const [fg, bg] = pair(classes, dark);
        expect(ratio(fg, bg)).toBeGreaterThanOrEqual(4.5); // WCAG 2.2, 1.4.3 contrast (minimum)
      });

  it('draws a result the engine cannot vouch for unlike any trusted verdict', () => {
    for (const v of Object.values(LOOK)) expect(v.box).not.toContain('border-dashed');
    expect(BEYOND_BOX).toContain('border-dashed');
  });
});
