import { describe, expect, it } from 'vitest';
import { EngineInputError, beatsPerMinute, levelSurvey, measureSourceFlow } from '@/lib/hydraulics';

describe('beats a minute from taps', () => {
  it('counts gaps, not taps: 21 taps a second apart over 20 s are 60 a minute', () => {
    const taps = Array.from({ length: 21 }, (_, i) => i);
    const r = beatsPerMinute({ tapsS: taps });
    // 20 gaps in 20 s = 1 beat a second = 60 a minute (arithmetic by hand, common practice, no source)
    expect(r.bpm).toBeCloseTo(60, 9);
    expect(r.beats).toBe(20);
    expect(r.tooShort).toBe(false);
    expect(r.uneven).toBe(false);
  });

  it('gives 45 a minute for 16 taps spread evenly over 20 s, and says a 10 s count is short', () => {
    // 15 gaps of 4/3 s: 60 × 15 / 20 = 45 (arithmetic by hand, common practice, no source)
    const taps = Array.from({ length: 16 }, (_, i) => (i * 4) / 3);
    expect(beatsPerMinute({ tapsS: taps }).bpm).toBeCloseTo(45, 9);
    // 10 s is under the 15 s the kit asks for (common practice, no source)
    expect(beatsPerMinute({ tapsS: taps.slice(0, 9) }).tooShort).toBe(true);
  });

  it('calls a missed beat or a doubled tap uneven', () => {
    // gaps 1,1,1,2,1,…: one beat not tapped; the 2 s gap is twice the middle gap of 1 s
    const missed = [0, 1, 2, 3, 5, 6, 7, 8, 9, 10, 11, 12, 13, 14, 15, 16, 17];
    const r = beatsPerMinute({ tapsS: missed });
    // 16 gaps, mean 17/16 = 1.0625 s, one of 2 s: sd = √((15 × 0.0625² + 0.9375²)/15) = 0.25,
    // cv = 0.235 (arithmetic by hand, common practice, no source)
    expect(r.gapCv).toBeCloseTo(0.235, 2);
    expect(r.uneven).toBe(true);
    // a tap doubled at 5.5 s splits one gap in halves of 0.5 s
    const doubled = [0, 1, 2, 3, 4, 5, 5.5, 6, 7, 8, 9, 10, 11, 12, 13, 14, 15, 16];
    expect(beatsPerMinute({ tapsS: doubled }).uneven).toBe(true);
    // a beat wandering ±10 % is a ram's own (common practice, no source)
    const wandering = [0, 1.1, 2, 3.1, 4, 5.1, 6, 7.1, 8, 9.1, 10, 11.1, 12, 13.1, 14, 15.1, 16];
    expect(beatsPerMinute({ tapsS: wandering }).uneven).toBe(false);
  });

  it('refuses taps out of order, naming the tap', () => {
    expect(() => beatsPerMinute({ tapsS: [0, 1, 1, 2] })).toThrow(EngineInputError);
    try {
      beatsPerMinute({ tapsS: [0, 1, 1, 2] });
    } catch (e) {
      expect((e as EngineInputError).field).toBe('tapsS.2');
    }
  });
});

describe('the fall from a hose-level survey', () => {
  it('sums the drops walking down', () => {
    // three stations reading 10/28, 8/25 and 12/25 in: drops 18, 17, 13 in, fall 48 in = 1.2192 m
    // (the surveying guide's worked example; 1 in = 0.0254 m, NIST SP 811, 2008)
    const inch = 0.0254;
    const r = levelSurvey({
      down: [
        { upperM: 10 * inch, lowerM: 28 * inch },
        { upperM: 8 * inch, lowerM: 25 * inch },
        { upperM: 12 * inch, lowerM: 25 * inch },
      ],
    });
    expect(r.legs.map((l) => l.dropM / inch)).toEqual([18, 17, 13].map((x) => expect.closeTo(x, 9)));
    expect(r.legs.map((l) => l.runningM / inch)).toEqual([18, 35, 48].map((x) => expect.closeTo(x, 9)));
    expect(r.fallM).toBeCloseTo(1.2192, 9);
    expect(r.closure).toBeUndefined();
  });

  it('lets the path rise and counts the rise against the fall', () => {
    // 0.40 m down, then 0.10 m up over a hump, then 0.50 m down: 0.80 m (arithmetic by hand, common practice, no source)
    const r = levelSurvey({
      down: [
        { upperM: 0.2, lowerM: 0.6 },
        { upperM: 0.5, lowerM: 0.4 },
        { upperM: 0.3, lowerM: 0.8 },
      ],
    });
    expect(r.legs.map((l) => l.dropM)).toEqual([0.4, -0.1, 0.5].map((x) => expect.closeTo(x, 9)));
    expect(r.fallM).toBeCloseTo(0.8, 9);
  });

  it('checks closure against the walk back', () => {
    const down = [
      { upperM: 0.2, lowerM: 0.7 },
      { upperM: 0.1, lowerM: 0.8 },
    ];
    // down 1.20 m; back 1.17 m: 3 cm apart, inside the guide's few centimetres (common practice, no source)
    const near = levelSurvey({
      down,
      back: [
        { upperM: 0.3, lowerM: 0.9 },
        { upperM: 0.25, lowerM: 0.82 },
      ],
    });
    expect(near.fallM).toBeCloseTo(1.2, 9);
    expect(near.closure?.backFallM).toBeCloseTo(1.17, 9);
    expect(near.closure?.misclosureM).toBeCloseTo(0.03, 9);
    expect(near.closure?.closes).toBe(true);
    // back 1.10 m: 10 cm apart, survey again (common practice, no source)
    const far = levelSurvey({
      down,
      back: [
        { upperM: 0.3, lowerM: 0.9 },
        { upperM: 0.3, lowerM: 0.8 },
      ],
    });
    expect(far.closure?.misclosureM).toBeCloseTo(0.1, 9);
    expect(far.closure?.closes).toBe(false);
  });

  it('refuses a reading longer than a pole, naming it', () => {
    try {
      levelSurvey({ down: [{ upperM: 0.2, lowerM: 7 }] });
      expect.unreachable();
    } catch (e) {
      expect((e as EngineInputError).field).toBe('down.0.lowerM');
    }
  });
});

describe('the trial timer uses the source flow calculator', () => {
  it('gives the mean and spread of three bucket trials', () => {
    // 5 US gal = 0.018927 m³ (NIST Handbook 44, 2023, 1 gal = 231 in³); 12.0, 12.6, 11.4 s:
    // q = 1.5773, 1.5021, 1.6603 L/s, mean 1.580 L/s, sd 0.0791 L/s (arithmetic by hand)
    const r = measureSourceFlow({
      method: 'bucket',
      trials: [12, 12.6, 11.4].map((timeS) => ({ volumeM3: 0.018927, timeS })),
    });
    expect(r.results.flowM3s * 1000).toBeCloseTo(1.58, 2);
    expect(r.results.stats!.sdM3s * 1000).toBeCloseTo(0.0791, 3);
  });
});
