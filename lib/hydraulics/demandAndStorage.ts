/**
 * Demand and storage: what the house, garden and animals need each day
 * against what the ram delivers in 24 hours, the tank for some days of
 * reserve, and how long it takes to refill.
 */
import * as z from 'zod/mini';
import {
  GARDEN_DEPTH_PER_WEEK_M,
  LIVESTOCK_KINDS,
  householdRate,
  livestockRates,
  type LivestockKind,
} from './demandRates';
import { flowM3s, parseInput, siNumber } from './schemaKit';
import { finish, step, sub, tq, type CalcOutput, type Step, type Warning } from './steps';
import { warn } from './warnings';
import { qty, say } from './message';

/** The animals as a step's title names them (the kinds are stored codes). */
const LIVESTOCK_WORDS: Record<LivestockKind, string> = {
  'beef-cow': 'beef cattle',
  'dairy-cow': 'dairy cows',
  horse: 'horses',
  sheep: 'sheep',
  goat: 'goats',
  pig: 'pigs',
  'chickens-per-100': 'chickens, per hundred',
};

export const demandAndStorageSchema = z.object({
  /** ram delivery averaged over 24 hours, m³/s */
  deliveredFlowM3s: flowM3s(),
  people: z._default(siNumber({ min: 0, max: 100, unit: '', integer: true }), 0),
  /** household use per person, m³/day; default USGS 80 US gal */
  perPersonM3PerDay: z.optional(siNumber({ min: 0, max: 2, unit: 'm³/day' })),
  gardenAreaM2: z._default(siNumber({ min: 0, max: 100000, unit: 'm²' }), 0),
  /** water depth per week on the garden, m; default 1 inch */
  gardenDepthPerWeekM: z._default(siNumber({ min: 0, max: 0.2, unit: 'm' }), GARDEN_DEPTH_PER_WEEK_M),
  livestock: z._default(
    z
      .array(
        z.object({
          kind: z.enum(LIVESTOCK_KINDS),
          count: siNumber({ min: 0, max: 100000, unit: '', integer: true }),
          /** override the table rate, m³/day per head */
          perHeadM3PerDay: z.optional(siNumber({ min: 0, max: 1, unit: 'm³/day' })),
        }),
      )
      .check(z.maxLength(30)),
    [],
  ),
  otherM3PerDay: z._default(siNumber({ min: 0, max: 1000, unit: 'm³/day' }), 0),
  /** days the tank should carry the demand with no delivery */
  reserveDays: z._default(siNumber({ min: 0, max: 60, unit: 'day' }), 3),
  /** an existing tank, m³ */
  tankVolumeM3: z.optional(siNumber({ min: 0, minExclusive: true, max: 10000, unit: 'm³' })),
});

export type DemandAndStorageInput = z.input<typeof demandAndStorageSchema>;

export interface DemandAndStorageResults {
  householdM3PerDay: number;
  gardenM3PerDay: number;
  livestockM3PerDay: number;
  otherM3PerDay: number;
  totalDemandM3PerDay: number;
  deliveryM3PerDay: number;
  surplusM3PerDay: number;
  /** delivery ÷ demand (0 when nothing is demanded) */
  coverage: number;
  reserveTankM3: number;
  /** time to refill the reserve tank from empty on the surplus, s (absent when there is no surplus) */
  reserveRefillTimeS?: number;
  tankDaysOfReserve?: number;
  tankRefillTimeS?: number;
}

/**
 * Daily demand against delivery, and storage.
 *
 * Formulas: household = people × rate; garden = area × depth/week ÷ 7;
 * livestock = Σ countᵢ × rateᵢ; demand D = sum; delivery V = q × 86,400 s;
 * surplus V − D; reserve tank = days × D; refill time = tank ÷ (surplus/86,400 s).
 * Units: m³/day, m³, s. Range: as the schema (0–100 people, garden ≤ 100,000 m²,
 * ≤ 30 livestock lines, reserve 0–60 days).
 * Reference: rates in demandRates.ts (USGS; extension livestock tables; from memory).
 * @example a neighbouring sheep farm waters 40 ewes from a ram giving 1 L/min
 * const input = { deliveredFlowM3s: toSI(1, 'L/min', 'flow'), livestock: [{ kind: 'sheep', count: 40 }] }
 * const r = planDemandAndStorage(input).results
 * // 40 × 2 US gal
 * r.livestockM3PerDay  // ≈ 0.3028
 * r.deliveryM3PerDay  // ≈ 1.44
 * r.surplusM3PerDay  // ≈ 1.137
 * // the default 3-day reserve, refilled from empty in 0.908/1.137 day
 * r.reserveTankM3  // ≈ 0.908
 * r.reserveRefillTimeS / 86400  // ≈ 0.80
 * r.reserveRefillTimeS  // ≈ 6.90e4
 */
export function planDemandAndStorage(input: DemandAndStorageInput): CalcOutput<DemandAndStorageResults> {
  const v = parseInput(demandAndStorageSchema, input);
  const steps: Step[] = [];
  const warnings: Warning[] = [];
  const perPerson = v.perPersonM3PerDay ?? householdRate().typicalM3PerDay;
  const house = v.people * perPerson;
  if (v.people > 0) {
    steps.push(
      step(
        'Household',
        'D_h = n \\times r_p',
        sub`D_h = ${v.people} \\times ${tq(perPerson, 'm³/day')}`,
        house,
        'm³/day',
        'dailyVolume',
        v.perPersonM3PerDay === undefined ? 'USGS: about 80–100 US gal per person per day (from memory).' : undefined,
      ),
    );
  }
  const garden = (v.gardenAreaM2 * v.gardenDepthPerWeekM) / 7;
  if (v.gardenAreaM2 > 0) {
    steps.push(
      step(
        'Garden',
        'D_g = \\frac{A\\,d_{week}}{7}',
        sub`D_g = \\frac{${tq(v.gardenAreaM2, 'm²')} \\times ${tq(v.gardenDepthPerWeekM, 'm', 'smallLength')}}{7}`,
        garden,
        'm³/day',
        'dailyVolume',
      ),
    );
  }
  const rates = livestockRates();
  let stock = 0;
  for (const a of v.livestock) {
    const r = a.perHeadM3PerDay ?? rates[a.kind].typicalM3PerDay;
    const d = a.count * r;
    stock += d;
    steps.push(
      step(
        `Livestock: ${LIVESTOCK_WORDS[a.kind]}`,
        'D_i = n_i \\times r_i',
        sub`D_i = ${a.count} \\times ${tq(r, 'm³/day')}`,
        d,
        'm³/day',
        'dailyVolume',
      ),
    );
  }
  const total = house + garden + stock + v.otherM3PerDay;
  steps.push(
    step(
      'Total demand',
      'D = D_h + D_g + \\sum D_i + D_o',
      sub`D = ${tq(house, 'm³/day')} + ${tq(garden, 'm³/day')} + ${tq(stock, 'm³/day')} + ${tq(v.otherM3PerDay, 'm³/day')}`,
      total,
      'm³/day',
      'dailyVolume',
    ),
  );
  const delivery = v.deliveredFlowM3s * 86400;
  steps.push(
    step(
      'Delivered in 24 hours',
      'V = q \\times 86\\,400\\,\\mathrm{s}',
      sub`V = ${tq(v.deliveredFlowM3s, 'm³/s')} \\times 86\\,400\\,\\mathrm{s}`,
      delivery,
      'm³/day',
      'dailyVolume',
    ),
  );
  const surplus = delivery - total;
  steps.push(
    step('Surplus', 'V - D', sub`${tq(delivery, 'm³/day')} - ${tq(total, 'm³/day')}`, surplus, 'm³/day', 'dailyVolume'),
  );
  const reserve = v.reserveDays * total;
  steps.push(
    step(
      'Tank for the reserve',
      'V_t = n_d \\times D',
      sub`V_t = ${tq(v.reserveDays, 'day')} \\times ${tq(total, 'm³/day')}`,
      reserve,
      'm³',
      'volume',
    ),
  );

  const results: DemandAndStorageResults = {
    householdM3PerDay: house,
    gardenM3PerDay: garden,
    livestockM3PerDay: stock,
    otherM3PerDay: v.otherM3PerDay,
    totalDemandM3PerDay: total,
    deliveryM3PerDay: delivery,
    surplusM3PerDay: surplus,
    coverage: total > 0 ? delivery / total : 0,
    reserveTankM3: reserve,
  };
  if (surplus > 0 && reserve > 0) {
    results.reserveRefillTimeS = (reserve / surplus) * 86400;
    steps.push(
      step(
        'Time to refill the reserve from empty',
        't = \\frac{V_t}{V - D}',
        sub`t = \\frac{${tq(reserve, 'm³')}}{${tq(surplus, 'm³/day')}}`,
        results.reserveRefillTimeS,
        's',
        'time',
      ),
    );
  }
  if (v.tankVolumeM3 !== undefined) {
    if (total > 0) results.tankDaysOfReserve = v.tankVolumeM3 / total;
    if (surplus > 0) {
      results.tankRefillTimeS = (v.tankVolumeM3 / surplus) * 86400;
      steps.push(
        step(
          'Time to refill the existing tank',
          't = \\frac{V_{tank}}{V - D}',
          sub`t = \\frac{${tq(v.tankVolumeM3, 'm³')}}{${tq(surplus, 'm³/day')}}`,
          results.tankRefillTimeS,
          's',
          'time',
        ),
      );
    }
  }

  if (surplus < 0) {
    warnings.push(
      warn(
        'demand-exceeds-delivery',
        say`The demand of ${qty('dailyVolume', total)} is more than the ${qty('dailyVolume', delivery)} the ram delivers; add a pump, find more fall or trim the demand.`,
      ),
    );
  }
  if (surplus <= 0 && (reserve > 0 || v.tankVolumeM3 !== undefined)) {
    warnings.push(
      warn(
        'tank-never-refills',
        'With no surplus over the day the tank never refills after a dry spell or a stoppage.',
      ),
    );
  }
  if (surplus > 0) {
    warnings.push(
      warn(
        'overflow-needed',
        say`The ram delivers ${qty('dailyVolume', surplus)} more than is used and never stops; give the tank an overflow back to the stream rather than shutting the delivery line, which makes the ram hammer.`,
      ),
    );
  }
  if (v.people > 0) {
    warnings.push(
      warn(
        'drinking-water-untreated',
        'Ram-pumped surface water is untreated: test it and treat it before drinking, and keep livestock away from the intake.',
      ),
    );
  }
  return finish(results, steps, warnings);
}
