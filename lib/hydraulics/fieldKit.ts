/**
 * The field kit's arithmetic: beats a minute from taps on a phone, and the fall from a
 * hose-level survey walked down from the intake to the pump. Bucket trials are the
 * source flow calculator's own (measureSourceFlow), so the timer and the calculator
 * never disagree. Pure, in SI, so it runs the same in the browser with no signal.
 */
import * as z from 'zod/mini';
import { EngineInputError } from './errors';
import { parseInput, siNumber } from './schemaKit';

/** Count beats for 15 to 30 s; fewer and one late tap moves the answer a lot (common practice, no source). */
export const BEAT_COUNT_SECONDS = { min: 15, max: 30 } as const;
/**
 * A gap this far from the middle gap was not one tap a beat: a missed beat doubles a gap,
 * a doubled tap halves one, while a ram's own beat wanders far less (common practice, no source).
 */
export const BEAT_GAP_RANGE = { min: 0.6, max: 1.5 } as const;

export const beatsSchema = z.object({
  /** when each beat was tapped, s from any start, in order */
  tapsS: z.array(siNumber({ min: 0, max: 600, unit: 's' })).check(z.minLength(3), z.maxLength(1000)),
});

export interface BeatsResult {
  /** beats a minute: gaps counted over the time from the first tap to the last */
  bpm: number;
  beats: number;
  durationS: number;
  /** sample standard deviation of the gaps ÷ their mean */
  gapCv: number;
  /** counted for less than BEAT_COUNT_SECONDS.min */
  tooShort: boolean;
  /** a gap outside BEAT_GAP_RANGE of the median gap: a missed or doubled tap */
  uneven: boolean;
}

/**
 * Beats a minute from tap times: n taps make n − 1 gaps, and
 * bpm = 60 · (n − 1) / (t_last − t_first). Counting gaps, not taps, is what keeps a
 * 20-second count of a pump beating once a second at 60 and not 63.
 * @example 16 taps 4/3 s apart: 15 gaps in 20 s
 * const r = beatsPerMinute({ tapsS: Array.from({ length: 16 }, (_, i) => (i * 4) / 3) })
 * // 60 × 15 / 20
 * r.bpm  // ≈ 45
 */
export function beatsPerMinute(input: z.input<typeof beatsSchema>): BeatsResult {
  const { tapsS } = parseInput(beatsSchema, input);
  const gaps = tapsS.slice(1).map((t, i) => t - tapsS[i]!);
  const back = gaps.findIndex((g) => g <= 0);
  if (back >= 0)
    throw new EngineInputError([{ field: `tapsS.${back + 1}`, message: 'each tap must come after the one before it' }]);
  const durationS = tapsS[tapsS.length - 1]! - tapsS[0]!;
  const mean = durationS / gaps.length;
  const sd = Math.sqrt(gaps.reduce((a, g) => a + (g - mean) ** 2, 0) / (gaps.length - 1 || 1));
  const gapCv = sd / mean;
  const sorted = [...gaps].sort((a, b) => a - b);
  const mid = sorted.length / 2;
  const median = sorted.length % 2 ? sorted[Math.floor(mid)]! : (sorted[mid - 1]! + sorted[mid]!) / 2;
  return {
    bpm: (60 * gaps.length) / durationS,
    beats: gaps.length,
    durationS,
    gapCv,
    tooShort: durationS < BEAT_COUNT_SECONDS.min,
    uneven: gaps.some((g) => g < BEAT_GAP_RANGE.min * median || g > BEAT_GAP_RANGE.max * median),
  };
}

/**
 * How far a survey walked back may disagree with the one walked down before it should
 * be done again: the "inch or two, a few centimetres" of the surveying guide
 * (common practice, no source).
 */
export const CLOSURE_TOLERANCE_M = 0.05;

const reading = () => siNumber({ min: 0, max: 5, unit: 'm' });
const leg = z.object({
  /** water height in the hose on the uphill pole, up from the pole's foot, m */
  upperM: reading(),
  /** the same on the downhill pole, m */
  lowerM: reading(),
});

export const levelSurveySchema = z.object({
  /** stations walking down from the intake to the pump */
  down: z.array(leg).check(z.minLength(1), z.maxLength(200)),
  /** stations walking back up, each read the same way (uphill pole, downhill pole) */
  back: z.optional(z.array(leg).check(z.maxLength(200))),
});

export interface LevelSurveyResult {
  /** each station's drop (negative where the path rises) and the fall so far */
  legs: { dropM: number; runningM: number }[];
  /** the fall from the intake to the pump: the sum of the drops */
  fallM: number;
  /** when the reader walked back: the fall that way, the difference, and whether it is small enough */
  closure?: { backFallM: number; misclosureM: number; toleranceM: number; closes: boolean };
}

/**
 * The fall from hose-level stations. The water stands level in the hose, so at each
 * station the ground drops by what the downhill pole reads more than the uphill one:
 * drop = lower − upper, and the fall is the running sum (the rise-and-fall method of
 * levelling). Walked back, the same sum should come out again; the difference is the
 * misclosure.
 * @example three stations reading 10/28, 8/25 and 12/25 in (drops 18, 17 and 13 in)
 * const i = 0.0254
 * const r = levelSurvey({ down: [{ upperM: 10 * i, lowerM: 28 * i }, { upperM: 8 * i, lowerM: 25 * i }, { upperM: 12 * i, lowerM: 25 * i }] })
 * // 48 in × 0.0254
 * r.fallM  // ≈ 1.2192
 */
export function levelSurvey(input: z.input<typeof levelSurveySchema>): LevelSurveyResult {
  const v = parseInput(levelSurveySchema, input);
  let running = 0;
  const legs = v.down.map((l) => {
    const dropM = l.lowerM - l.upperM;
    running += dropM;
    return { dropM, runningM: running };
  });
  const out: LevelSurveyResult = { legs, fallM: running };
  if (v.back && v.back.length > 0) {
    const backFallM = v.back.reduce((a, l) => a + (l.lowerM - l.upperM), 0);
    const misclosureM = running - backFallM;
    out.closure = {
      backFallM,
      misclosureM,
      toleranceM: CLOSURE_TOLERANCE_M,
      closes: Math.abs(misclosureM) <= CLOSURE_TOLERANCE_M,
    };
  }
  return out;
}
