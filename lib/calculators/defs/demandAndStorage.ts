import Qty from 'js-quantities';
import {
  demandAndStorageSchema,
  EngineInputError,
  livestockRates,
  planDemandAndStorage,
  type LivestockKind,
} from '@/lib/hydraulics';
import { defineCalculator, type FieldDef } from '../types';

/** MDX prop → livestock kind; chickens are counted per bird and the table is per 100 birds. */
const ANIMALS: { prop: string; kind: LivestockKind; label: string; perHundred?: boolean }[] = [
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
      type: 'text',
      name: 'garden',
      prop: 'garden',
      label: 'Garden area',
      placeholder: '200 ft2',
      help: 'Watered about an inch a week.',
    },
    ...ANIMALS.map((a): FieldDef => ({
      type: 'number',
      name: `animal.${a.prop}`,
      prop: a.prop,
      label: a.label,
      min: 0,
      step: 1,
    })),
    { type: 'number', name: 'reserveDays', prop: 'reserveDays', label: 'Days of reserve', min: 0, max: 60 },
    { type: 'quantity', name: 'tankVolumeM3', prop: 'tank', label: 'Tank you have (optional)', qty: 'volume' },
  ],
  defaults: { delivery: '800 L/day', people: '0', reserveDays: '3' },
  toInput: (v) => {
    const animals = (v.animal ?? {}) as Record<string, unknown>;
    const rates = ANIMALS.filter((a) => count(animals[a.prop]) > 0);
    return {
      deliveredFlowM3s: Number(v.deliveryPerDay) / 86_400,
      people: count(v.people),
      gardenAreaM2: parseArea(String(v.garden ?? '')),
      livestock: rates.map((a) =>
        // The table is per 100 birds and counts are whole: 12 chickens go in as one flock at 12/100 of the table's rate.
        a.perHundred
          ? {
              kind: a.kind,
              count: 1,
              perHeadM3PerDay: (livestockRates()[a.kind].typicalM3PerDay * count(animals[a.prop])) / 100,
            }
          : { kind: a.kind, count: count(animals[a.prop]) },
      ),
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
