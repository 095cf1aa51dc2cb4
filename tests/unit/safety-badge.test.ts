import { describe, expect, it } from 'vitest';
import { contrastRatio } from '@/lib/charts/contrast';
import { textOnBackground } from '../support/class-colours';
import { SAFETY_LOOK } from '@/components/guides/SafetyBadge';

// WCAG 2.2 contrast ratio (W3C, WCAG 2.2, definitions "relative luminance" and "contrast ratio")
const ratio = contrastRatio;
const pair = textOnBackground;

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
