import { FALL_METHODS, fromSI, householdRate, planSite, sitePlanSchema } from '@/lib/hydraulics';
import { defineCalculator, type FieldDef } from '../types';
import { PUMP_TYPE_OPTIONS } from '../options';
import { ANIMAL_COUNT_FIELDS, ANIMALS, livestockInput } from './demandAndStorage';
import { MONTH_NAMES } from '@/lib/dates';

/**
 * The site planner's survey as a form: the same field kit, unit switch, share link and
 * server recompute as the calculators, one engine call (planSite) for the whole plan.
 * It is not one of the calculators' list: /plan draws it.
 */
const FALL_METHOD_LABELS: Record<(typeof FALL_METHODS)[number], string> = {
  'level-and-staff': 'A level and a staff, station by station',
  'hose-level': 'A water-filled hose level',
  'pressure-gauge': 'A pressure gauge on a filled hose',
  'gps-or-map': 'GPS or a map (rough: measure before you build)',
  other: 'Another way',
};

const count = (v: unknown) => Math.max(0, Math.round(Number(v ?? 0)));

export const SURVEY_GROUPS = {
  ground: ['fallM', 'fallMethod', 'liftM', 'sourceToPumpRunM', 'pumpToTankRunM'],
  water: ['spareFlowM3s', 'wetFlowM3s', 'driestMonth'],
  demand: [
    'demand.people',
    'demand.perPersonM3PerDay',
    'demand.gardenAreaM2',
    'demand.otherM3PerDay',
    ...ANIMALS.map((a) => `animal.${a.prop}`),
  ],
  site: ['conditions', 'reserveDays', 'deliveryLossShare', 'pumpType'],
} as const;

const fields: FieldDef[] = [
  {
    type: 'quantity',
    name: 'fallM',
    prop: 'fall',
    label: 'Fall',
    qty: 'length',
    help: 'From the intake’s water surface down to where the pump will sit.',
  },
  {
    type: 'select',
    name: 'fallMethod',
    prop: 'fallMethod',
    label: 'How the fall was measured',
    options: FALL_METHODS.map((m) => ({ value: m, label: FALL_METHOD_LABELS[m] })),
  },
  {
    type: 'quantity',
    name: 'liftM',
    prop: 'lift',
    label: 'Lift',
    qty: 'length',
    help: 'From the pump up to where the water enters the tank.',
  },
  {
    type: 'quantity',
    name: 'sourceToPumpRunM',
    prop: 'sourceRun',
    label: 'Run from the intake to the pump',
    qty: 'length',
    help: 'Measured along the ground.',
  },
  {
    type: 'quantity',
    name: 'pumpToTankRunM',
    prop: 'tankRun',
    label: 'Run from the pump to the tank',
    qty: 'length',
    help: 'Measured along the ground.',
  },
  {
    type: 'quantity',
    name: 'spareFlowM3s',
    prop: 'spareFlow',
    label: 'Flow the source can spare in the driest month',
    qty: 'flow',
    help: 'What you can take and still leave the stream what it needs; the source flow calculator measures it.',
  },
  {
    type: 'quantity',
    name: 'wetFlowM3s',
    prop: 'wetFlow',
    label: 'Flow it can spare in the wettest month (optional)',
    qty: 'flow',
  },
  {
    type: 'select',
    name: 'driestMonth',
    prop: 'driestMonth',
    label: 'The driest month',
    options: MONTH_NAMES.map((m, i) => ({ value: String(i + 1), label: m })),
  },
  { type: 'number', name: 'demand.people', prop: 'people', label: 'People', min: 0, step: 1 },
  {
    type: 'quantity',
    name: 'demand.perPersonM3PerDay',
    prop: 'perPerson',
    label: 'Water per person a day',
    qty: 'dailyVolume',
  },
  { type: 'quantity', name: 'demand.gardenAreaM2', prop: 'garden', label: 'Garden area (optional)', qty: 'area' },
  ...ANIMAL_COUNT_FIELDS,
  {
    type: 'quantity',
    name: 'demand.otherM3PerDay',
    prop: 'other',
    label: 'Other use a day (optional)',
    qty: 'dailyVolume',
  },
  {
    type: 'checks',
    name: 'conditions',
    prop: 'site',
    label: 'The site',
    options: [
      { value: 'freezes', label: 'It freezes in winter' },
      { value: 'drinking', label: 'The water is for drinking' },
    ],
  },
  {
    type: 'number',
    name: 'reserveDays',
    prop: 'reserveDays',
    label: 'Days of reserve in the tank',
    min: 0,
    max: 60,
    step: 1,
  },
  {
    type: 'number',
    name: 'deliveryLossShare',
    prop: 'deliveryLoss',
    label: 'Delivery line friction you accept (share of the lift)',
    percent: true,
    help: 'As 10 % or 0.1: a tenth of the lift is common practice.',
  },
  { type: 'select', name: 'pumpType', prop: 'pumpType', label: 'Pumps', options: PUMP_TYPE_OPTIONS },
];

export const sitePlanner = defineCalculator(planSite, {
  id: 'site-plan',
  name: 'Site plan',
  line: 'From a survey to a verdict, a design and a parts list.',
  blurb: 'Your survey in; whether a ram works here, what to build and what to buy out.',
  guide: 'choosing-a-pump-size',
  schema: sitePlanSchema,
  fields,
  // an invented smallholding: a brook with 4 ft of fall, a house 29 ft above the pump
  defaults: {
    fall: '4 ft',
    fallMethod: 'hose-level',
    lift: '29 ft',
    sourceRun: '30 ft',
    tankRun: '150 ft',
    spareFlow: '10 gal/min',
    driestMonth: '8',
    people: '2',
    // the engine's household rate in the US gallons its table is written in
    perPerson: `${+fromSI(householdRate().typicalM3PerDay, 'gal/day', 'dailyVolume').toFixed(1)} gal/day`,
    chickens: '12',
    reserveDays: '3',
    deliveryLoss: '10%',
    pumpType: 'homemade',
  },
  toInput: (v) => {
    const animals = (v.animal ?? {}) as Record<string, unknown>;
    const demand = (v.demand ?? {}) as Record<string, unknown>;
    const conditions = (v.conditions ?? []) as string[];
    const rest = Object.fromEntries(
      Object.entries(v).filter(([k]) => !['animal', 'conditions', 'demand', 'driestMonth'].includes(k)),
    );
    const driestMonth = v.driestMonth;
    return {
      ...rest,
      ...(driestMonth !== undefined ? { driestMonth: Number(driestMonth) } : {}),
      freezes: conditions.includes('freezes'),
      drinkingWater: conditions.includes('drinking'),
      demand: {
        people: count(demand.people),
        ...(typeof demand.perPersonM3PerDay === 'number' ? { perPersonM3PerDay: demand.perPersonM3PerDay } : {}),
        gardenAreaM2: typeof demand.gardenAreaM2 === 'number' ? demand.gardenAreaM2 : 0,
        otherM3PerDay: typeof demand.otherM3PerDay === 'number' ? demand.otherM3PerDay : 0,
        livestock: livestockInput(animals),
      },
    };
  },
  rows: (r) => [
    { label: 'Demand per day', value: r.demandM3PerDay, qty: 'dailyVolume', emphasis: true },
    { label: 'Delivered per day', value: r.deliveredM3PerDay, qty: 'dailyVolume', emphasis: true },
  ],
});
