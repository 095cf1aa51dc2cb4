/**
 * The causes a stall check can name, the symptoms that point to each, and
 * the guide that explains the fix. Symptom weights (0–1) say how strongly a
 * symptom suggests the cause — common practice, no source: the trade's
 * usual troubleshooting order, not a measured statistic.
 */
import type { GuideSlug } from './warnings';

export const SYMPTOMS = [
  'never-starts',
  'stops-after-some-beats',
  'weak-delivery',
  'hammering',
  'spits-air',
  'waterlogged-air-chamber',
  'delivery-stops-in-frost',
] as const;
export type Symptom = (typeof SYMPTOMS)[number];

export const SYMPTOM_LABELS: Record<Symptom, string> = {
  'never-starts': 'never starts',
  'stops-after-some-beats': 'stops after some beats',
  'weak-delivery': 'weak delivery',
  hammering: 'hammering or banging',
  'spits-air': 'spits air',
  'waterlogged-air-chamber': 'water-logged air chamber',
  'delivery-stops-in-frost': 'delivery stops in frost',
};

export interface CauseInfo {
  title: string;
  guide: GuideSlug;
  symptoms: Partial<Record<Symptom, number>>;
}

const CAUSES = {
  'drive-pipe-outside-range': {
    title: 'Drive pipe length outside the usual range',
    guide: 'the-drive-pipe',
    symptoms: { 'never-starts': 0.6, 'stops-after-some-beats': 0.5, 'weak-delivery': 0.5 },
  },
  'drive-flow-above-source': {
    title: 'Pumps use more drive water than the source spares',
    guide: 'surveying-fall-and-flow',
    symptoms: { 'stops-after-some-beats': 0.8, 'spits-air': 0.7, 'weak-delivery': 0.3, 'never-starts': 0.3 },
  },
  'lift-too-high': {
    title: 'Lift too high for the fall',
    guide: 'will-a-ram-meet-my-demand',
    symptoms: { 'never-starts': 0.5, 'weak-delivery': 0.7, 'stops-after-some-beats': 0.2 },
  },
  'flexible-drive-pipe': {
    title: 'Flexible drive pipe soaks up the surge',
    guide: 'the-drive-pipe',
    symptoms: { 'never-starts': 0.6, 'weak-delivery': 0.6, 'stops-after-some-beats': 0.3 },
  },
  'waste-valve-setting': {
    title: 'Waste valve stroke or weight needs setting',
    guide: 'first-start-and-tuning',
    symptoms: { 'never-starts': 0.8, 'stops-after-some-beats': 0.7, 'weak-delivery': 0.6, hammering: 0.3 },
  },
  'delivery-valve-or-snifter': {
    title: 'Delivery (check) valve leaking or sticking, or snifter blocked',
    guide: 'when-it-stops-cycling',
    symptoms: { 'weak-delivery': 0.7, 'waterlogged-air-chamber': 0.6, 'stops-after-some-beats': 0.3, hammering: 0.4 },
  },
  'air-in-drive-pipe': {
    title: 'Air getting into the drive pipe',
    guide: 'the-drive-pipe',
    symptoms: { 'spits-air': 0.9, 'stops-after-some-beats': 0.6, 'weak-delivery': 0.4, 'never-starts': 0.3 },
  },
  'flooded-waste-outlet': {
    title: 'Waste outlet flooded or backed up',
    guide: 'care-frost-floods-and-water-rights',
    symptoms: { 'never-starts': 0.7, 'stops-after-some-beats': 0.6, 'weak-delivery': 0.3 },
  },
  debris: {
    title: 'Debris in the intake, drive pipe or valves',
    guide: 'when-it-stops-cycling',
    symptoms: { 'weak-delivery': 0.5, 'stops-after-some-beats': 0.5, 'never-starts': 0.4 },
  },
  'waterlogged-air-chamber': {
    title: 'Air chamber has lost its air',
    guide: 'when-it-stops-cycling',
    symptoms: { hammering: 0.9, 'waterlogged-air-chamber': 0.9, 'weak-delivery': 0.4 },
  },
  'frozen-line': {
    title: 'Ice in the delivery line or pump',
    guide: 'care-frost-floods-and-water-rights',
    symptoms: { 'delivery-stops-in-frost': 1, 'stops-after-some-beats': 0.2 },
  },
  'fall-too-small': {
    title: 'Too little fall to drive the pump',
    guide: 'surveying-fall-and-flow',
    symptoms: { 'never-starts': 0.6, 'weak-delivery': 0.4 },
  },
  'fittings-in-drive-pipe': {
    title: 'Elbows, tees or valves in the drive pipe',
    guide: 'the-drive-pipe',
    symptoms: { 'never-starts': 0.4, 'weak-delivery': 0.5, 'stops-after-some-beats': 0.2 },
  },
  'delivery-line-friction': {
    title: 'Delivery line too small or too long',
    guide: 'the-delivery-line',
    symptoms: { 'weak-delivery': 0.6, 'never-starts': 0.2 },
  },
  'start-procedure': {
    title: 'Not yet primed and started',
    guide: 'first-start-and-tuning',
    symptoms: { 'never-starts': 0.7 },
  },
} as const satisfies Record<string, CauseInfo>;

export type StallCauseCode = keyof typeof CAUSES;
export const STALL_CAUSES: Record<StallCauseCode, CauseInfo> = CAUSES;
export const STALL_CAUSE_CODES = Object.keys(CAUSES) as StallCauseCode[];
