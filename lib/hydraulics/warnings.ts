/**
 * Every warning the engine can raise: a stable code, its severity and the
 * guide that explains what to do. Messages are written where the warning is
 * raised so they can carry the numbers.
 */
import type { Severity, Warning } from './steps';
import { metricText, renderMessage, type MessagePart } from './message';

/** Guide topic slugs (content/guides). */
export const GUIDES = [
  'how-a-ram-pump-works',
  'surveying-fall-and-flow',
  'will-a-ram-meet-my-demand',
  'the-drive-pipe',
  'the-delivery-line',
  'first-start-and-tuning',
  'pumps-in-parallel-and-in-stages',
  'storage-overflow-and-float-valves',
  'when-it-stops-cycling',
  'care-frost-floods-and-water-rights',
  'choosing-a-pump-size',
  'the-intake-and-supply',
  'building-a-ram-from-fittings',
] as const;
export type GuideSlug = (typeof GUIDES)[number];

/** Added to every safety-relevant message. */
export const DEFER =
  'Follow local codes and the authority that issues permits, and have a licensed plumber or engineer check the installation.';

const CATALOGUE = {
  // yield estimate
  'fall-below-minimum': ['caution', 'surveying-fall-and-flow'],
  'lift-ratio-low': ['info', 'will-a-ram-meet-my-demand'],
  'lift-ratio-beyond-range': ['caution', 'will-a-ram-meet-my-demand'],
  'efficiency-above-typical': ['caution', 'how-a-ram-pump-works'],
  'efficiency-below-typical': ['info', 'first-start-and-tuning'],
  // array planner
  'drive-exceeds-source': ['danger', 'surveying-fall-and-flow'],
  'drive-near-source-limit': ['caution', 'surveying-fall-and-flow'],
  'fitting-in-drive-pipe': ['caution', 'the-drive-pipe'],
  'fittings-stop-pump': ['danger', 'the-drive-pipe'],
  'delivery-friction-high': ['caution', 'the-delivery-line'],
  'upper-pump-part-time': ['caution', 'pumps-in-parallel-and-in-stages'],
  'lower-stage-limit': ['info', 'pumps-in-parallel-and-in-stages'],
  // drive pipe check
  'drive-length-short-for-fall': ['caution', 'the-drive-pipe'],
  'drive-length-long-for-fall': ['caution', 'the-drive-pipe'],
  'drive-ld-low': ['caution', 'the-drive-pipe'],
  'drive-ld-high': ['caution', 'the-drive-pipe'],
  'surge-exceeds-rating': ['danger', 'the-drive-pipe'],
  'surge-margin-low': ['caution', 'the-drive-pipe'],
  'flexible-drive-pipe': ['caution', 'the-drive-pipe'],
  'valve-closure-slow': ['info', 'how-a-ram-pump-works'],
  'shut-off-exceeds-rating': ['danger', 'first-start-and-tuning'],
  'threaded-joint-refused': ['danger', 'the-drive-pipe'],
  'fatigue-life-short': ['caution', 'the-drive-pipe'],
  // delivery line
  'delivery-loss-high': ['caution', 'the-delivery-line'],
  'delivery-velocity-high': ['caution', 'the-delivery-line'],
  'transitional-flow': ['info', 'the-delivery-line'],
  'hazen-williams-outside-range': ['info', 'the-delivery-line'],
  'delivery-pressure-above-rating': ['danger', 'the-delivery-line'],
  'no-standard-pipe-meets-target': ['caution', 'the-delivery-line'],
  'frost-risk': ['caution', 'care-frost-floods-and-water-rights'],
  // source flow
  'diversion-rules': ['caution', 'care-frost-floods-and-water-rights'],
  'plan-exceeds-source': ['danger', 'surveying-fall-and-flow'],
  'plan-takes-large-share': ['caution', 'surveying-fall-and-flow'],
  'bucket-spread-high': ['info', 'surveying-fall-and-flow'],
  'few-trials': ['info', 'surveying-fall-and-flow'],
  'weir-head-out-of-range': ['caution', 'surveying-fall-and-flow'],
  'weir-not-fully-contracted': ['info', 'surveying-fall-and-flow'],
  // demand and storage
  'demand-exceeds-delivery': ['caution', 'will-a-ram-meet-my-demand'],
  'drinking-water-untreated': ['danger', 'care-frost-floods-and-water-rights'],
  'tank-never-refills': ['caution', 'storage-overflow-and-float-valves'],
  'overflow-needed': ['info', 'storage-overflow-and-float-valves'],
  // stall check
  'high-water-safety': ['danger', 'care-frost-floods-and-water-rights'],
  'air-chamber-safety': ['danger', 'when-it-stops-cycling'],
  // site plan
  'plan-pressure': ['danger', 'building-a-ram-from-fittings'],
  'plan-water-in-motion': ['danger', 'care-frost-floods-and-water-rights'],
  'plan-freezes': ['caution', 'care-frost-floods-and-water-rights'],
  'plan-standpipe-needed': ['info', 'the-intake-and-supply'],
} as const satisfies Record<string, readonly [Severity, GuideSlug]>;

export type WarningCode = keyof typeof CATALOGUE;

/** All warning codes the engine can produce. */
export const WARNING_CODES = Object.keys(CATALOGUE) as WarningCode[];

/** Guide and severity of each warning code. */
export const WARNING_INFO: Record<WarningCode, { severity: Severity; guide: GuideSlug }> = Object.fromEntries(
  Object.entries(CATALOGUE).map(([k, [severity, guide]]) => [k, { severity, guide }]),
) as Record<WarningCode, { severity: Severity; guide: GuideSlug }>;

const SAFETY: ReadonlySet<WarningCode> = new Set<WarningCode>([
  'surge-exceeds-rating',
  'surge-margin-low',
  'shut-off-exceeds-rating',
  'threaded-joint-refused',
  'fatigue-life-short',
  'delivery-pressure-above-rating',
  'drinking-water-untreated',
  'diversion-rules',
  'frost-risk',
  'high-water-safety',
  'air-chamber-safety',
  'plan-pressure',
  'plan-water-in-motion',
  'plan-freezes',
]);

/**
 * Builds a warning; safety warnings get the deferral sentence appended. A message with
 * quantities (written with `say`) keeps them as parts, so the reader sees them in their
 * own units; `message` is its metric reading.
 * @example
 * warn('frost-risk', 'Drain it.').severity  // → 'caution'
 * warn('frost-risk', 'Drain it.').guide  // → 'care-frost-floods-and-water-rights'
 * warn('frost-risk', 'Drain it.').message  // → `Drain it. ${DEFER}`
 * warn('few-trials', 'Time three fills.').message  // → 'Time three fills.'
 * @example a quantity in the words
 * warn('fall-below-minimum', ['A fall of ', qty('length', 0.5), '.']).message  // → 'A fall of 0.5 m.'
 * warn('fall-below-minimum', ['A fall of ', qty('length', 0.5), '.']).parts[1]  // → { kind: 'length', si: 0.5 }
 */
export function warn(code: WarningCode, message: string | MessagePart[]): Warning {
  const info = WARNING_INFO[code];
  const parts: MessagePart[] = typeof message === 'string' ? [message] : [...message];
  if (SAFETY.has(code)) parts.push(` ${DEFER}`);
  const warning: Warning = {
    code,
    severity: info.severity,
    message: renderMessage(parts, metricText),
    guide: info.guide,
  };
  if (parts.some((p) => typeof p !== 'string')) warning.parts = parts;
  return warning;
}
