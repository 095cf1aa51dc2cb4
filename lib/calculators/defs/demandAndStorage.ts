import Qty from 'js-quantities';
import {
  demandAndStorageSchema,
  EngineInputError,
  fromSI,
  GARDEN_DEPTH_PER_WEEK_M,
  householdRate,
  livestockRates,
  planDemandAndStorage,
  roundAsWritten,
  type LivestockKind,
} from '@/lib/hydraulics';
import { defineCalculator, type FieldDef, type FormState } from '../types';

/** MDX prop → livestock kind; chickens are counted per bird and the table is per 100 birds. */
export const ANIMALS: { prop: string; kind: LivestockKind; label: string; perHundred?: boolean }[] = [
  { prop: 'sheep', kind: 'sheep', label: 'Sheep' },
  { prop: 'goats', kind: 'goat', label: 'Goats' },
  { prop: 'beefCattle', kind: 'beef-cow', label: 'Beef cattle' },
  { prop: 'dairyCows', kind: 'dairy-cow', label: 'Dairy cows (milking)' },
  { prop: 'horses', kind: 'horse', label: 'Horses' },
  { prop: 'pigs', kind: 'pig', label: 'Pigs' },
  { prop: 'chickens', kind: 'chickens-per-100', label: 'Chickens', perHundred: true },
];

/** Garden area through js-quantities: "200 ft2", "20 m^2", "0.1 acre". */
export function parseArea(text: string): number {
  const t = text.trim();
  if (t === '') return 0;
  try {
    const q = Qty.parse(t.replace(/(ft|m|yd|in)2\b/g, '$1^2'));
    if (!q) throw new Error('unreadable');
    if (q.isUnitless()) throw new Error('unitless');
    return q.to('m^2').scalar;
  } catch {
    throw new EngineInputError([
      { field: 'garden', message: `could not read "${text}" as an area; type e.g. "200 ft2" or "20 m2"` },
    ]);
  }
}

const count = (v: unknown) => Math.max(0, Math.round(Number(v ?? 0)));

/** One count box a kind of stock ("animal.sheep"), as the demand calculator and the site planner ask them. */
export const ANIMAL_COUNT_FIELDS: FieldDef[] = ANIMALS.map((a) => ({
  type: 'number',
  name: `animal.${a.prop}`,
  prop: a.prop,
  label: a.label,
  min: 0,
  step: 1,
}));

/**
 * The engine's livestock lines from the count boxes, each at `rateOf` (the table's rate
 * unless given). The table is per 100 birds and counts are whole: 12 chickens go in as
 * one flock at 12/100 of the table's rate.
 */
export function livestockInput(
  animals: Record<string, unknown>,
  rateOf: (a: (typeof ANIMALS)[number]) => number = (a) => livestockRates()[a.kind].typicalM3PerDay,
) {
  return ANIMALS.filter((a) => count(animals[a.prop]) > 0).map((a) =>
    a.perHundred
      ? { kind: a.kind, count: 1, perHeadM3PerDay: (rateOf(a) * count(animals[a.prop])) / 100 }
      : { kind: a.kind, count: count(animals[a.prop]), perHeadM3PerDay: rateOf(a) },
  );
}

/**
 * The engine's rates as the form's defaults, in the US gallons its tables are
 * written in, so the default reads back exactly and a form saved before the
 * rates were inputs recomputes unchanged.
 */
const usGalPerDay = (m3PerDay: number) => `${+fromSI(m3PerDay, 'gal/day', 'dailyVolume').toFixed(6)} gal/day`;
const RATE_DEFAULTS: Record<string, string> = Object.fromEntries(
  ANIMALS.map((a) => [`${a.prop}Rate`, usGalPerDay(livestockRates()[a.kind].typicalM3PerDay)]),
);
/**
 * A rate stands for the table's when it reads the same as the table's written in litres
 * or US gallons a day: a metric reader's default opens as 303 L/day for the table's
 * 80 US gal, and the working should still name the table.
 */
const same = (a: number, b: number) =>
  (['L/day', 'gal/day'] as const).some(
    (u) =>
      roundAsWritten(fromSI(a, u, 'dailyVolume'), u, 'dailyVolume') ===
      roundAsWritten(fromSI(b, u, 'dailyVolume'), u, 'dailyVolume'),
  );
const rateField = (name: string) => `rate.${name}`;
const RATE_OF = new Map(ANIMALS.map((a) => [rateField(a.prop), `animal.${a.prop}`]));

export const demandAndStorage = defineCalculator(planDemandAndStorage, {
  id: 'demand-and-storage',
  name: 'Demand and storage',
  line: 'House, garden and stock against 24 hours of delivery; the tank.',
  blurb: 'Household, garden and stock against what the ram delivers in 24 hours, and the tank to carry you over.',
  guide: 'storage-overflow-and-float-valves',
  schema: demandAndStorageSchema,
  fields: [
    { type: 'quantity', name: 'deliveryPerDay', prop: 'delivery', label: 'Ram delivery per day', qty: 'dailyVolume' },
    { type: 'number', name: 'people', prop: 'people', label: 'People', min: 0, step: 1 },
    {
      type: 'quantity',
      name: 'perPersonM3PerDay',
      prop: 'perPerson',
      label: 'Water per person a day',
      qty: 'dailyVolume',
      help: {
        US: 'About 80 US gal in a US home with mains habits (USGS); a frugal off-grid home uses far less.',
        metric: 'About 300 L in a US home with mains habits (USGS); a frugal off-grid home uses far less.',
      },
    },
    { type: 'quantity', name: 'gardenAreaM2', prop: 'garden', label: 'Garden area (optional)', qty: 'area' },
    {
      type: 'quantity',
      name: 'gardenDepthPerWeekM',
      prop: 'gardenDepth',
      label: 'Garden watering depth per week',
      qty: 'smallLength',
      help: {
        US: 'About an inch a week in the growing season (common practice, no source).',
        metric: 'About 25 mm a week in the growing season (common practice, no source).',
      },
    },
    ...ANIMAL_COUNT_FIELDS,

    ...ANIMALS.map((a): FieldDef => ({
      type: 'quantity',
      name: rateField(a.prop),
      prop: `${a.prop}Rate`,
      label: a.perHundred ? `${a.label}: water per 100 birds a day` : `${a.label}: water per head a day`,
      qty: 'dailyVolume',
    })),
    { type: 'number', name: 'reserveDays', prop: 'reserveDays', label: 'Days of reserve', min: 0, max: 60 },
    { type: 'quantity', name: 'tankVolumeM3', prop: 'tank', label: 'Tank you have (optional)', qty: 'volume' },
  ],
  defaults: {
    delivery: '800 L/day',
    people: '0',
    perPerson: usGalPerDay(householdRate().typicalM3PerDay),
    gardenDepth: `${GARDEN_DEPTH_PER_WEEK_M * 1000} mm`,
    reserveDays: '3',
    ...RATE_DEFAULTS,
  },
  // a rate is asked only for the stock the reader keeps
  visible: (name: string, state: FormState) => {
    const countField = RATE_OF.get(name);
    return countField === undefined || count(state[countField]?.text) > 0;
  },
  toInput: (v) => {
    const animals = (v.animal ?? {}) as Record<string, unknown>;
    const given = (v.rate ?? {}) as Record<string, unknown>;
    const rateOf = (a: (typeof ANIMALS)[number]) => {
      const table = livestockRates()[a.kind].typicalM3PerDay;
      const rate = given[a.prop];
      return typeof rate === 'number' && !same(rate, table) ? rate : table;
    };
    return {
      deliveredFlowM3s: Number(v.deliveryPerDay) / 86_400,
      people: count(v.people),
      // the engine's own rate when the reader kept it, so its working still names the source
      ...(typeof v.perPersonM3PerDay === 'number' && !same(v.perPersonM3PerDay, householdRate().typicalM3PerDay)
        ? { perPersonM3PerDay: v.perPersonM3PerDay }
        : {}),
      gardenAreaM2: typeof v.gardenAreaM2 === 'number' ? v.gardenAreaM2 : 0,
      ...(v.gardenDepthPerWeekM !== undefined ? { gardenDepthPerWeekM: v.gardenDepthPerWeekM } : {}),
      livestock: livestockInput(animals, rateOf),
      reserveDays: v.reserveDays === undefined ? 3 : Number(v.reserveDays),
      ...(v.tankVolumeM3 !== undefined ? { tankVolumeM3: v.tankVolumeM3 } : {}),
    };
  },
  rows: (r) => [
    { label: 'Demand per day', value: r.totalDemandM3PerDay, qty: 'dailyVolume', emphasis: true },
    { label: 'Delivery per day', value: r.deliveryM3PerDay, qty: 'dailyVolume', emphasis: true },
    {
      label: r.surplusM3PerDay >= 0 ? 'To spare per day' : 'Short per day',
      value: Math.abs(r.surplusM3PerDay),
      qty: 'dailyVolume',
    },
    { label: 'Household', value: r.householdM3PerDay, qty: 'dailyVolume' },
    { label: 'Garden', value: r.gardenM3PerDay, qty: 'dailyVolume' },
    { label: 'Livestock', value: r.livestockM3PerDay, qty: 'dailyVolume' },
    { label: 'Tank for the reserve', value: r.reserveTankM3, qty: 'volume' },
    ...(r.reserveRefillTimeS !== undefined
      ? [{ label: 'Refill from empty', value: r.reserveRefillTimeS / 3600, unit: 'hours' }]
      : []),
    ...(r.tankDaysOfReserve !== undefined
      ? [{ label: 'Your tank carries', value: r.tankDaysOfReserve, unit: 'days' }]
      : []),
  ],
});
