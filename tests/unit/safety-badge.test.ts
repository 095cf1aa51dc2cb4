import { describe, expect, it } from 'vitest';
import { palette } from '@/tailwind.config';
import { SAFETY_LOOK } from '@/components/guides/SafetyBadge';

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
function pair(classes: string, dark: boolean): [string, string] {
  const prefix = dark ? 'dark:' : '';
  const pick = (kind: 'text' | 'bg') => {
    const m = classes.split(/\s+/).find((c) => c.startsWith(`${prefix}${kind}-`) && (dark || !c.includes(':')));
    if (!m) throw new Error(`no ${prefix}${kind} in ${classes}`);
    return colour(m.slice(prefix.length + kind.length + 1));
  };
  return [pick('text'), pick('bg')];
}

describe('safety badges', () => {
  for (const [state, look] of Object.entries(SAFETY_LOOK))
    for (const dark of [false, true])
      it(`"${state}" text is at least 4.5:1 on its background, ${dark ? 'dark' : 'light'}`, () => {
        const [fg, bg] = pair(look.classes, dark);
        expect(ratio(fg, bg)).toBeGreaterThanOrEqual(4.5); // WCAG 2.2, 1.4.3 contrast (minimum)
      });

  it('says a "needs changes" verdict in its own words and the caution amber, not the green of a sound one', () => {
    const needs = SAFETY_LOOK['needs changes'];
    expect(needs.words).toBe('Safety check: needs changes');
    expect(needs.caution).toBe(true);
    expect(needs.classes).toContain('signal');
    expect(needs.classes).not.toContain('moss');
    expect(SAFETY_LOOK.checked.classes).toContain('moss');
    expect(new Set(Object.values(SAFETY_LOOK).map((l) => l.words)).size).toBe(4);
  });
});
