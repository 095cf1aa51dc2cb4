/**
 * Demo field log: invented tests on invented sites. The one-pump against two-pump
 * comparison at Ferncombe is written out by hand; the rest are generated from a fixed
 * seed with efficiencies inside the engine's typical band, drive flows inside the
 * pump size's typical range and bucket trials that scatter by a few per cent.
 */
import type { Transaction } from 'sequelize';
import { efficiencyBand, typicalDriveFlow, type NominalSize } from '@/lib/hydraulics';
import { entryRows } from '@/lib/field-log/store';
import { fieldLogEntrySchema, type FieldLogEntryInput } from '@/lib/validation/field-log';
import type { initModels } from '@/models';

type Demo = FieldLogEntryInput & { author: string; key?: string };

/** One 1" pump, then two 1" pumps in parallel into the same ¾" delivery line. */
export const FERNCOMBE_ONE_PUMP: Demo = {
  key: 'ferncombe-one',
  author: 'ferncombe_tamsin',
  siteName: 'Ferncombe lower meadow',
  testedOn: '',
  pumpType: 'homemade',
  pumpSize: '1',
  pumpCount: 1,
  arrangement: 'single',
  fall: '2.4 m',
  lift: '12 m',
  driveLength: '14 m',
  driveSize: '1',
  driveMaterial: 'galvanized-steel',
  deliveryLength: '90 m',
  deliverySize: '3/4',
  deliveryMaterial: 'hdpe',
  driveFlow: '28 L/min',
  driveFlowMethod: 'measured',
  driveFlowHow: 'waste valve outflow and delivery caught together in a 20 L bucket, timed',
  trials: [
    { volume: '3 L', seconds: 57.2 },
    { volume: '3 L', seconds: 58.6 },
    { volume: '3 L', seconds: 56.1 },
  ],
  bpm: 58,
  wasteValveSetting: 'stroke 9 mm, one washer on the valve stem',
  waterTempC: 9,
  notes:
    'Baseline with the single pump before adding the second one beside it. Steady beat, no air in the drive pipe after bleeding.',
};

export const FERNCOMBE_TWO_PUMPS: Demo = {
  ...FERNCOMBE_ONE_PUMP,
  key: 'ferncombe-two',
  pumpCount: 2,
  arrangement: 'parallel',
  driveFlow: '50 L/min',
  driveFlowHow: 'both waste valves and the delivery caught together, timed; the intake box drew down about 2 cm',
  trials: [
    { volume: '5 L', seconds: 57.0 },
    { volume: '5 L', seconds: 55.4 },
    { volume: '5 L', seconds: 58.3 },
  ],
  bpm: 61,
  wasteValveSetting: 'both pumps: stroke 9 mm, one washer',
  notes:
    'Second 1" pump on its own drive pipe from the same intake, both into the one ¾" delivery line through a tee. Clearly more water at the tank, but not double: the intake cannot give two full drive flows and the line pushes back harder.',
};

interface SiteRecipe {
  author: string;
  siteName: string;
  pumpType: 'homemade' | 'commercial';
  pumpSize: NominalSize;
  fallM: number;
  liftM: number;
  driveLengthM: number;
  driveMaterial: 'pvc' | 'hdpe' | 'galvanized-steel' | 'steel';
  deliveryLengthM: number;
  deliverySize: NominalSize;
  tests: number;
}

const SITES: SiteRecipe[] = [
  {
    author: 'highcrag_shepherd',
    siteName: 'Highcrag sheepfold spring',
    pumpType: 'homemade',
    pumpSize: '3/4',
    fallM: 1.5,
    liftM: 18,
    driveLengthM: 9,
    driveMaterial: 'galvanized-steel',
    deliveryLengthM: 210,
    deliverySize: '1/2',
    tests: 4,
  },
  {
    author: 'sorrel_cabin',
    siteName: 'Sorrel Creek cabin',
    pumpType: 'homemade',
    pumpSize: '1/2',
    fallM: 1.2,
    liftM: 8.8,
    driveLengthM: 6,
    driveMaterial: 'pvc',
    deliveryLengthM: 60,
    deliverySize: '1/2',
    tests: 4,
  },
  {
    author: 'ironwheel_builds',
    siteName: 'Ironwheel test bench',
    pumpType: 'commercial',
    pumpSize: '1-1/2',
    fallM: 3,
    liftM: 24,
    driveLengthM: 18,
    driveMaterial: 'steel',
    deliveryLengthM: 150,
    deliverySize: '1',
    tests: 5,
  },
  {
    author: 'ironwheel_builds',
    siteName: 'Mill leat orchard',
    pumpType: 'commercial',
    pumpSize: '2',
    fallM: 2,
    liftM: 9,
    driveLengthM: 15,
    driveMaterial: 'galvanized-steel',
    deliveryLengthM: 120,
    deliverySize: '1',
    tests: 3,
  },
  {
    author: 'quarry_lane_valves',
    siteName: 'Quarry Lane valve trials',
    pumpType: 'homemade',
    pumpSize: '1-1/4',
    fallM: 2.5,
    liftM: 30,
    driveLengthM: 16,
    driveMaterial: 'pvc',
    deliveryLengthM: 180,
    deliverySize: '3/4',
    tests: 5,
  },
  {
    author: 'quarry_lane_valves',
    siteName: 'Fellside trough',
    pumpType: 'homemade',
    pumpSize: '1',
    fallM: 4,
    liftM: 16,
    driveLengthM: 24,
    driveMaterial: 'galvanized-steel',
    deliveryLengthM: 140,
    deliverySize: '3/4',
    tests: 3,
  },
  {
    author: 'ferncombe_tamsin',
    siteName: 'Ferncombe top garden',
    pumpType: 'homemade',
    pumpSize: '3/4',
    fallM: 1.8,
    liftM: 5.4,
    driveLengthM: 10,
    driveMaterial: 'pvc',
    deliveryLengthM: 45,
    deliverySize: '1/2',
    tests: 3,
  },
  {
    author: 'highcrag_shepherd',
    siteName: 'Highcrag ghyll',
    pumpType: 'homemade',
    pumpSize: '1',
    fallM: 3.2,
    liftM: 48,
    driveLengthM: 20,
    driveMaterial: 'galvanized-steel',
    deliveryLengthM: 320,
    deliverySize: '3/4',
    tests: 3,
  },
];

/** mulberry32: a small fixed-seed generator, so the demo is the same every time. */
function generator(seed: number) {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

const round = (x: number, d: number) => Math.round(x * 10 ** d) / 10 ** d;
const VALVE_SETTINGS = [
  'stroke 8 mm',
  'stroke 10 mm',
  'stroke 12 mm, light spring',
  'two washers on the stem',
  'stroke 6 mm, short and fast',
];

function generated(): Demo[] {
  const rnd = generator(20261202);
  const out: Demo[] = [];
  for (const s of SITES) {
    const range = typicalDriveFlow(s.pumpSize);
    for (let i = 0; i < s.tests; i++) {
      const liftM = round(s.liftM * (1 + (i - 1) * 0.08), 1);
      const band = efficiencyBand(s.pumpType, liftM / s.fallM);
      const eta = band.low + (band.high - band.low) * (0.25 + 0.5 * rnd());
      const qLmin = round((range.lowM3s + (range.highM3s - range.lowM3s) * (0.3 + 0.4 * rnd())) * 60_000, 1);
      const deliveredLmin = (eta * qLmin * s.fallM) / liftM;
      const volumeL = [1, 2, 3, 5, 10, 20].find((v) => (v / deliveredLmin) * 60 >= 25) ?? 20;
      const trials = [0, 1, 2].map(() => ({
        volume: `${volumeL} L`,
        seconds: round((volumeL / deliveredLmin) * 60 * (0.96 + 0.08 * rnd()), 1),
      }));
      out.push({
        author: s.author,
        siteName: s.siteName,
        testedOn: '',
        pumpType: s.pumpType,
        pumpSize: s.pumpSize,
        pumpCount: 1,
        arrangement: 'single',
        fall: `${s.fallM} m`,
        lift: `${liftM} m`,
        driveLength: `${s.driveLengthM} m`,
        driveSize: s.pumpSize,
        driveMaterial: s.driveMaterial,
        deliveryLength: `${s.deliveryLengthM} m`,
        deliverySize: s.deliverySize,
        deliveryMaterial: 'hdpe',
        driveFlow: `${qLmin} L/min`,
        driveFlowMethod: rnd() < 0.7 ? 'measured' : 'estimated',
        driveFlowHow: 'bucket under the waste valve plus the delivery, timed',
        trials,
        bpm: Math.round(45 + 30 * rnd()),
        wasteValveSetting: VALVE_SETTINGS[Math.floor(rnd() * VALVE_SETTINGS.length)],
        waterTempC: Math.round(5 + 10 * rnd()),
        notes:
          i === 0
            ? 'First test after commissioning.'
            : `Test ${i + 1}: delivery outlet moved to ${liftM} m above the pump.`,
      });
    }
  }
  return out;
}

/** Every demo entry in the order they are written, oldest first. */
export function demoFieldLog(): Demo[] {
  return [FERNCOMBE_ONE_PUMP, FERNCOMBE_TWO_PUMPS, ...generated()];
}

const DAY = 86_400_000;

/** Writes the demo entries and the Ferncombe before/after link, in the seed's transaction. */
export async function seedFieldLog(
  models: ReturnType<typeof initModels>,
  userId: (handle: string) => number,
  now: Date,
  transaction: Transaction,
) {
  const { FieldLogEntry, FieldLogTrial, FieldLogLink } = models;
  const all = demoFieldLog();
  const ids = new Map<string, number>();
  for (const [i, d] of all.entries()) {
    const { author, key, ...input } = d;
    const testedOn = new Date(now.getTime() - (all.length - i) * 6 * DAY).toISOString().slice(0, 10);
    const rows = entryRows(userId(author), fieldLogEntrySchema.parse({ ...input, testedOn }));
    const createdAt = new Date(`${testedOn}T18:00:00Z`);
    const e = await FieldLogEntry.create({ ...rows.entry, createdAt, updatedAt: createdAt }, { transaction });
    await FieldLogTrial.bulkCreate(
      rows.trials.map((t) => ({ ...t, entryId: e.id })),
      { transaction },
    );
    if (key) ids.set(key, e.id);
  }
  await FieldLogLink.create(
    {
      beforeId: ids.get('ferncombe-one')!,
      afterId: ids.get('ferncombe-two')!,
      whatChanged: 'a second 1" pump in parallel on its own drive pipe, into the same delivery line',
      createdBy: userId('ferncombe_tamsin'),
    },
    { transaction },
  );
}
