/**
 * Demo sites: invented installations of the demo scenario, each survey planned by the
 * engine at seed time exactly as a member's save is (planFromSurvey), never a stored
 * plan. Highcrag's far paddock is public, with three versions, three field log tests
 * recorded on it and the flood question about it; Sorrel Creek's cabin is shared by
 * link; Ferncombe's top garden is private.
 */
import type { Transaction } from 'sequelize';
import { planFromSurvey } from '@/lib/sites/plan';
import { planLayout, predictedDelivery, versionOn } from '@/lib/sites/measured';
import { entryPrefill } from '@/lib/sites/prefill';
import { entryRows } from '@/lib/field-log/store';
import { fieldLogEntrySchema, type FieldLogEntryInput } from '@/lib/validation/field-log';
import type { UnitSystem } from '@/lib/hydraulics';
import type { SiteVisibility } from '@/lib/vocabulary';
import type { initModels } from '@/models';

/** A test on a demo site: the day's drive flow as a share of the plan's, and what the buckets caught as a share of the plan's figure for that flow (invented). */
interface DemoSiteTest {
  daysAgo: number;
  driveShare: number;
  deliveryShare: number;
  bpm: number;
  wasteValveSetting: string;
  waterTempC: number;
  notes: string;
}

export interface DemoSite {
  publicId: string;
  owner: string;
  name: string;
  visibility: SiteVisibility;
  /** the units the owner planned in */
  units: UnitSystem;
  versions: { daysAgo: number; survey: Record<string, string> }[];
  tests?: DemoSiteTest[];
  /** a demo thread (by title) asked about this site */
  question?: string;
}

const HIGHCRAG_FIRST = {
  fall: '1.4 m',
  fallMethod: 'gps-or-map',
  lift: '16 m',
  sourceRun: '12 m',
  tankRun: '280 m',
  spareFlow: '40 L/min',
  driestMonth: '8',
  people: '0',
  sheep: '120',
  reserveDays: '3',
  site: 'freezes',
  pumpType: 'homemade',
};

export const demoSites: DemoSite[] = [
  {
    publicId: 'HcFarPaddock26',
    owner: 'highcrag_shepherd',
    name: 'Highcrag far paddock',
    visibility: 'public',
    units: 'metric',
    versions: [
      // a first guess of the fall from the map
      { daysAgo: 240, survey: HIGHCRAG_FIRST },
      // the fall measured with a hose level: more than the map said
      { daysAgo: 226, survey: { ...HIGHCRAG_FIRST, fall: '1.7 m', fallMethod: 'hose-level' } },
      // a winter's flow measured too, and five days in the tank for the lambing field
      {
        daysAgo: 90,
        survey: { ...HIGHCRAG_FIRST, fall: '1.7 m', fallMethod: 'hose-level', wetFlow: '120 L/min', reserveDays: '5' },
      },
    ],
    tests: [
      {
        daysAgo: 190,
        driveShare: 0.98,
        deliveryShare: 0.97,
        bpm: 52,
        wasteValveSetting: 'stroke 10 mm',
        waterTempC: 8,
        notes: 'First test after commissioning; trough full by evening.',
      },
      {
        daysAgo: 100,
        driveShare: 0.84,
        deliveryShare: 0.9,
        bpm: 55,
        wasteValveSetting: 'stroke 10 mm',
        waterTempC: 13,
        notes: 'Dry spell: the ghyll is low, less drive water. Beat steady.',
      },
      {
        daysAgo: 15,
        driveShare: 0.93,
        deliveryShare: 0.72,
        bpm: 49,
        wasteValveSetting: 'stroke 10 mm',
        waterTempC: 7,
        notes: 'After the spate: drive pipe flushed, new screen fitted. Beat sounds rough and the delivery is down.',
      },
    ],
    question: 'Flood took the intake screen — what now?',
  },
  {
    publicId: 'SorrelCabin4ft',
    owner: 'sorrel_cabin',
    name: 'Sorrel Creek cabin',
    visibility: 'link',
    units: 'US',
    versions: [
      {
        daysAgo: 60,
        survey: {
          fall: '4 ft',
          fallMethod: 'hose-level',
          lift: '29 ft',
          sourceRun: '25 ft',
          tankRun: '200 ft',
          spareFlow: '4 gal/min',
          wetFlow: '25 gal/min',
          driestMonth: '9',
          people: '2',
          reserveDays: '5',
          site: 'freezes,drinking',
          pumpType: 'homemade',
        },
      },
    ],
  },
  {
    publicId: 'FerncombeTop18',
    owner: 'ferncombe_tamsin',
    name: 'Ferncombe top garden',
    visibility: 'private',
    units: 'metric',
    versions: [
      {
        daysAgo: 30,
        survey: {
          fall: '1.8 m',
          fallMethod: 'level-and-staff',
          lift: '5.4 m',
          sourceRun: '10 m',
          tankRun: '45 m',
          spareFlow: '30 L/min',
          driestMonth: '8',
          people: '4',
          garden: '300 m2',
          goats: '3',
          chickens: '20',
          reserveDays: '3',
          pumpType: 'homemade',
        },
      },
    ],
  },
];

/** A demo site's version planned as a save plans it; a survey the engine refuses stops the seed. */
export function plannedVersion(site: DemoSite, survey: Record<string, string>) {
  const { form, planned } = planFromSurvey(survey, site.units);
  if (!planned.ok) throw new Error(`demo site ${site.name}: ${planned.message}`);
  return {
    survey: form,
    plan: planned.output.results as unknown as Record<string, unknown>,
    engineVersion: planned.engineVersion,
  };
}

const DAY = 86_400_000;
const round = (x: number, d: number) => Math.round(x * 10 ** d) / 10 ** d;
const day = (now: Date, daysAgo: number) => new Date(now.getTime() - daysAgo * DAY);

/**
 * A test's entry as the member would type it: the installation from the plan in force
 * that day (as the form fills it), the day's drive flow, and three bucket trials that
 * catch the invented share of what the plan gives for that flow, scattered by ±2 %.
 */
export function demoSiteEntry(
  site: DemoSite,
  t: DemoSiteTest,
  version: { plan: Record<string, unknown> },
  now: Date,
): FieldLogEntryInput {
  const layout = planLayout(version.plan);
  if (!layout) throw new Error(`demo site ${site.name}: its plan builds no pump to test`);
  const testedOn = day(now, t.daysAgo).toISOString().slice(0, 10);
  const driveLmin = round(layout.driveFlowM3s * t.driveShare * 60_000, 1);
  const driveFlowM3s = driveLmin / 60_000;
  const predicted = predictedDelivery(layout, {
    fallM: layout.fallM,
    liftM: layout.liftM,
    driveFlowM3s,
    waterTempC: t.waterTempC,
  });
  const deliveredLmin = (predicted ?? 0) * t.deliveryShare * 60_000;
  if (!(deliveredLmin > 0)) throw new Error(`demo site ${site.name}: no prediction for the test ${t.daysAgo} days ago`);
  const volumeL = [1, 2, 3, 5, 10, 20].find((v) => (v / deliveredLmin) * 60 >= 25) ?? 20;
  const seconds = (volumeL / deliveredLmin) * 60;
  return {
    ...entryPrefill(site.name, layout, 'metric'),
    testedOn,
    pumpCount: layout.pumpCount,
    driveFlow: `${driveLmin} L/min`,
    driveFlowMethod: 'measured',
    driveFlowHow: 'waste valve and delivery caught together in a bucket, timed',
    trials: [0.98, 1.02, 1].map((k) => ({ volume: `${volumeL} L`, seconds: round(seconds * k, 1) })),
    bpm: t.bpm,
    wasteValveSetting: t.wasteValveSetting,
    waterTempC: t.waterTempC,
    notes: t.notes,
  } as FieldLogEntryInput;
}

/** How many field log entries the demo sites add to the field log. */
export const demoSiteTestCount = () => demoSites.reduce((n, s) => n + (s.tests?.length ?? 0), 0);

/** Writes the demo sites, their versions, their tests and the question about one, in the seed's transaction. */
export async function seedSites(
  models: ReturnType<typeof initModels>,
  userId: (handle: string) => number,
  now: Date,
  transaction: Transaction,
) {
  const { Site, SiteVersion, FieldLogEntry, FieldLogTrial, Question } = models;
  for (const s of demoSites) {
    const first = day(now, s.versions[0]!.daysAgo);
    const last = day(now, s.versions[s.versions.length - 1]!.daysAgo);
    const site = await Site.create(
      {
        publicId: s.publicId,
        ownerId: userId(s.owner),
        name: s.name,
        visibility: s.visibility,
        createdAt: first,
        updatedAt: last,
      },
      { transaction },
    );
    const versions = s.versions.map((v, i) => ({
      version: i + 1,
      createdAt: day(now, v.daysAgo).toISOString(),
      ...plannedVersion(s, v.survey),
    }));
    for (const v of versions)
      await SiteVersion.create({ siteId: site.id, ...v, createdAt: new Date(v.createdAt) }, { transaction });
    for (const t of s.tests ?? []) {
      const testedOn = day(now, t.daysAgo).toISOString().slice(0, 10);
      const input = demoSiteEntry(s, t, versionOn(versions, testedOn)!, now);
      const rows = entryRows(userId(s.owner), fieldLogEntrySchema.parse(input));
      const createdAt = new Date(`${testedOn}T17:00:00Z`);
      const e = await FieldLogEntry.create(
        { ...rows.entry, siteId: site.id, createdAt, updatedAt: createdAt },
        { transaction },
      );
      await FieldLogTrial.bulkCreate(
        rows.trials.map((x) => ({ ...x, entryId: e.id })),
        { transaction },
      );
    }
    if (s.question) {
      const [n] = await Question.update({ siteId: site.id }, { where: { title: s.question }, transaction });
      if (n !== 1) throw new Error(`demo site ${s.name}: no question "${s.question}"`);
    }
  }
}
