/**
 * Pump size choice against hand calculations. Every number is worked here from its source:
 * - drive flow by size (US gal/min): ½" 1–3, ¾" 2–5, 1" 3–8, 1¼" 5–14, 1½" 7–20, 2" 12–35 —
 *   common practice, no published source found (the engine's table, pumpSizes.ts);
 * - efficiency against lift ratio: International Textbook Co., Building Trades Pocketbook
 *   (1899–1905), "The Hydraulic Ram": 6 → 0.61, 8 → 0.52; a homemade ram half of it (Water for the
 *   World RWS.4.D.5, USAID: E = 0.33 home-built against 0.66 commercial);
 * - 1 US gal = 231 in³ = 3.785411784 L (NIST Handbook 44); 1 ft = 0.3048 m (exact);
 * - the 1.2 design margin and the 10 % delivery friction: common practice, no source.
 */
import { describe, expect, it } from 'vitest';
import { EngineInputError, choosePump, renderMessage, metricText } from '@/lib/hydraulics';

const GAL = 3.785411784e-3; // m³ (NIST Handbook 44)
const gpm = (x: number) => (x * GAL) / 60;
const H = 4 * 0.3048; // 4 ft fall
const h = 29 * 0.3048; // 29 ft lift
const hp = h * 1.1; // lift plus 10 % friction (common practice, no source)
// Pocketbook between ratios 6 (0.61) and 8 (0.52), halved for a homemade ram
const pocketbook = (r: number) => 0.61 - (0.09 * (r - 6)) / 2;
const eta = 0.5 * pocketbook(hp / H);
const text = (parts: Parameters<typeof renderMessage>[0]) => renderMessage(parts, metricText);

describe('one pump', () => {
  // 0.2 m³/day demand, 1.2 × = 0.24 m³/day; drive needed Q = D·h_p/(η·H)
  const need = (0.24 / 86400) * (hp / (eta * H));
  const r = choosePump({ fallM: H, liftM: h, spareFlowM3s: gpm(10), demandM3PerDay: 0.2 });
  it('is the smallest size whose range holds the drive flow needed', () => {
    expect(eta).toBeCloseTo(0.26056, 4); // 0.5 × (0.61 − 0.09 × 0.9875)
    expect(need / gpm(1)).toBeCloseTo(1.348, 2); // inside ½" 1–3 gal/min
    expect(r.arrangement).toBe('single');
    expect(r.pumps?.size).toBe('1/2');
    expect(r.pumps?.count).toBe(1);
    expect(r.pumps?.driveFlowEachM3s).toBeCloseTo(need, 9);
    expect(r.deliveredM3PerDay).toBeCloseTo(0.24, 6);
    expect(r.meetsDemand).toBe(true);
  });
  it('says why the next size up is worse and that none is smaller', () => {
    // ¾" beats only from 2 gal/min, more than the 1.35 needed
    expect(text(r.nextSizeUp)).toMatch(/¾" pump beats steadily only on 7\.57 L\/min/);
    expect(text(r.nextSizeDown)).toMatch(/smallest size/);
  });
});

describe('a demand one small pump cannot meet', () => {
  // 1 m³/day, 1.2 wanted: Q = 1.2/86400 × h_p/(η·H) = 6.74 gal/min
  const need = (1.2 / 86400) * (hp / (eta * H));
  it('takes one 1-inch pump when every size is allowed (¾" tops out at 5 gal/min)', () => {
    expect(need / gpm(1)).toBeCloseTo(6.738, 2);
    const r = choosePump({ fallM: H, liftM: h, spareFlowM3s: gpm(10), demandM3PerDay: 1 });
    expect(r.arrangement).toBe('single');
    expect(r.pumps?.size).toBe('1');
    // ¾" at its 5 gal/min top: 1.2 × 5/6.738 = 0.890 m³/day
    const downParts = r.nextSizeDown.filter((p) => typeof p !== 'string');
    expect(downParts[0]).toEqual({ kind: 'dailyVolume', si: expect.closeTo((1.2 * gpm(5)) / need, 6) });
  });
  it('takes ½" pumps in parallel when ½" is the largest built: ceil(6.74/3) = 3', () => {
    const r = choosePump({ fallM: H, liftM: h, spareFlowM3s: gpm(10), demandM3PerDay: 1, largestSize: '1/2' });
    expect(r.arrangement).toBe('parallel');
    expect(r.pumps?.count).toBe(3);
    expect(r.pumps?.driveFlowEachM3s).toBeCloseTo(need / 3, 9); // 2.25 gal/min each
    expect(r.deliveredM3PerDay).toBeCloseTo(1.2, 6);
    expect(text(r.nextSizeUp)).toMatch(/largest size you build/);
  });
});

describe('a demand beyond the largest size', () => {
  // 30 m³/day, 36 wanted: Q = 36/86400 × h_p/(η·H) = 202 gal/min, past 4"'s 130: two 4" pumps on 101 each
  const need = (36 / 86400) * (hp / (eta * H));
  const r = choosePump({ fallM: H, liftM: h, spareFlowM3s: gpm(250), demandM3PerDay: 30 });
  it('takes two 4-inch pumps in parallel, and says two 3-inch pumps fall short', () => {
    expect(need / gpm(1)).toBeCloseTo(202.1, 1);
    expect(r.arrangement).toBe('parallel');
    expect(r.pumps?.size).toBe('4');
    expect(r.pumps?.count).toBe(2);
    expect(r.pumps?.driveFlowEachM3s).toBeCloseTo(need / 2, 9);
    // two 3" at their 75 gal/min top: 36 × 150/202.1 = 26.7 m³/day
    expect(text(r.nextSizeDown)).toMatch(
      /^2 3" pumps deliver at most 26,700 L\/day, less than the 36,000 L\/day wanted/,
    );
    expect(text(r.nextSizeUp)).toMatch(/largest size in the table/);
  });
});

describe('a lift beyond one ram', () => {
  // 40 m above a 4 ft fall: 32.8 times, past the Pocketbook's 26
  const lift = 40;
  const h1 = Math.sqrt(lift * H); // both stages at the ratio √(h/H) (common practice, no source)
  const r = choosePump({ fallM: H, liftM: lift, spareFlowM3s: gpm(40), demandM3PerDay: 0.3 });
  const etaStage = 0.5 * pocketbook((lift * 1.1) / h1);
  const upperDrive = (0.36 / 86400) * ((lift * 1.1) / (etaStage * h1));
  const lowerDrive = upperDrive * ((h1 * 1.1) / (etaStage * H));
  it('is staged through a tank at √(h·H)', () => {
    expect(h1).toBeCloseTo(6.9834, 3);
    expect(etaStage).toBeCloseTo(0.29824, 4); // ratio 6.30
    expect(r.arrangement).toBe('staged');
    expect(r.upper?.tankHeightM).toBeCloseTo(h1, 9);
    // upper: 1.40 gal/min → ½"; lower: 29.5 gal/min → 2" (12–35)
    expect(upperDrive / gpm(1)).toBeCloseTo(1.395, 2);
    expect(r.upper?.size).toBe('1/2');
    expect(lowerDrive / gpm(1)).toBeCloseTo(29.48, 1);
    expect(r.pumps?.size).toBe('2');
    expect(r.pumps?.totalDriveFlowM3s).toBeCloseTo(lowerDrive, 9);
    expect(r.deliveredM3PerDay).toBeCloseTo(0.36, 6);
  });
});

describe('a source too small for any ram', () => {
  it('says the source spares less than the smallest size needs', () => {
    const r = choosePump({ fallM: H, liftM: h, spareFlowM3s: gpm(0.5), demandM3PerDay: 0.2 });
    expect(r.arrangement).toBe('none');
    expect(r.pumps).toBeNull();
    // 0.5 and 1 gal/min in L/min: 1.89 and 3.79
    expect(text(r.why)).toMatch(/spares 1\.89 L\/min, less than the 3\.79 L\/min the smallest/);
  });
});

describe('bad input', () => {
  it('names the field', () => {
    const bad = (input: Parameters<typeof choosePump>[0]) => {
      try {
        choosePump(input);
      } catch (e) {
        expect(e).toBeInstanceOf(EngineInputError);
        return (e as EngineInputError).field;
      }
      return 'no error';
    };
    expect(bad({ fallM: H, liftM: 1, spareFlowM3s: gpm(5), demandM3PerDay: 1 })).toBe('liftM');
    expect(bad({ fallM: H, liftM: h, spareFlowM3s: gpm(5), demandM3PerDay: 0 })).toBe('demandM3PerDay');
    expect(bad({ fallM: H, liftM: h, spareFlowM3s: -1, demandM3PerDay: 1 })).toBe('spareFlowM3s');
  });
});
