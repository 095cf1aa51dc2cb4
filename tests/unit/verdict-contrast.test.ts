import { describe, expect, it } from 'vitest';
import { contrastRatio } from '@/lib/charts/contrast';
import { textOnBackground } from '../support/class-colours';
import { BEYOND_BADGE, BEYOND_BOX, LOOK } from '@/components/calculators/kit/VerdictLine';

// WCAG 2.2 contrast ratio (W3C, WCAG 2.2, definitions "relative luminance" and "contrast ratio")
const ratio = contrastRatio;
const pair = textOnBackground;

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
