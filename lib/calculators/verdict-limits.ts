import { maxLiftRatio, PRACTICE, RATING_MARGIN, FATIGUE_DESIGN_LIFE_YEARS } from '@/lib/hydraulics';

/**
 * What a calculator's numbers mean for this site, in the site plan's words:
 * works, marginal, won't work here. `ask` is a card that cannot judge yet
 * because the reader has not said what they need (demand and storage with no
 * demand). `beyondRange` marks a result outside what the engine's sources
 * cover: the card draws it apart from a trusted one and says so.
 */
export type VerdictLevel = 'works' | 'marginal' | 'wont-work' | 'ask';

export interface Verdict {
  level: VerdictLevel;
  /** one sentence in plain words, numbers in the reader's units */
  reason: string;
  /** the result lies outside the range the engine's published figures cover */
  beyondRange: boolean;
  /** where the lines this verdict draws come from, for the card's Sources */
  sources: readonly string[];
}

/** The headline words for each level, as the site plan uses them (DESIGN.md). */
export const VERDICT_WORDS: Record<VerdictLevel, string> = {
  works: 'Works',
  marginal: 'Marginal',
  'wont-work': 'Won’t work here',
  ask: 'Tell it what you need',
};

/** Said with every result the engine cannot vouch for. */
export const BEYOND_RANGE_WORDS = 'Outside what the engine can vouch for';

export interface VerdictLimit {
  value: number;
  source: string;
}

const NO_SOURCE = 'common practice, no source';

/**
 * The lines the verdicts draw. Most are the engine's own figures (their
 * sources travel with them); the few that are this module's own say so.
 */
export const VERDICT_LIMITS = {
  /** beyond this lift ratio the efficiency table the engine uses reaches zero */
  maxLiftRatio: {
    value: maxLiftRatio('homemade'),
    source: 'Building Trades Pocketbook (International Textbook Co., 1899–1905), efficiency table ends at 26',
  },
  /**
   * Past 20 times the fall the Pocketbook table gives 14 % or less, a fifth of its
   * first row: a small error in the fall swings the delivery widely.
   */
  marginalLiftRatio: { value: 20, source: NO_SOURCE },
  /** below twice the fall the ram wastes most of its water for little height (the engine's own caution) */
  lowLiftRatio: { value: 2, source: NO_SOURCE },
  minFallM: PRACTICE.minFallM,
  driveLengthToFallMin: PRACTICE.driveLengthToFallMin,
  driveLengthToFallMax: PRACTICE.driveLengthToFallMax,
  sourceShare: PRACTICE.sourceShareCaution,
  deliveryLossShare: PRACTICE.deliveryLossShare,
  /** delivery friction more than the lift itself at least doubles the head the ram works against */
  deliveryLossWontWork: { value: 1, source: NO_SOURCE },
  ratingMargin: RATING_MARGIN,
  fatigueYears: { value: FATIGUE_DESIGN_LIFE_YEARS, source: NO_SOURCE },
  /** delivery at least this many times the demand leaves room for a dry week and a leak */
  demandCover: { value: 1.2, source: NO_SOURCE },
  /** the stall check's cause scores: a strong sign and some sign */
  strongCause: { value: 0.6, source: NO_SOURCE },
  someCause: { value: 0.3, source: NO_SOURCE },
} as const satisfies Record<string, VerdictLimit>;

/** How strongly the numbers and symptoms point at a stall cause, in words rather than a number to chase. */
export function causeStrength(score: number): 'strong sign' | 'some sign' | 'faint sign' {
  return score >= VERDICT_LIMITS.strongCause.value
    ? 'strong sign'
    : score >= VERDICT_LIMITS.someCause.value
      ? 'some sign'
      : 'faint sign';
}

export const verdict = (level: VerdictLevel, reason: string, beyondRange = false): Verdict => ({
  level,
  reason,
  beyondRange,
  sources: [],
});

/** A ratio as a person says it: "7.3 times", "26 times". */
export const times = (x: number) => `${x >= 10 ? Math.round(x) : Math.round(x * 10) / 10} times`;

/** A share as a person says it: "12 %". */
export const percent = (x: number) => (x > 0 && x < 0.005 ? 'under 1 %' : `${Math.round(x * 100)} %`);
