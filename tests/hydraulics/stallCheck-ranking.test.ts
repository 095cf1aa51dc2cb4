import { describe, expect, it } from 'vitest';
import { DRIVE_PIPE_GUIDES, PRACTICE, SYMPTOMS, runStallCheck, type Symptom } from '@/lib/hydraulics';
import { drivePipe, ft } from './fixtures';

/** A beginner's site: 20 ft of 1" schedule 40 PVC on a 5 ft fall, 30 ft lift — invented demo numbers. */
const shortPipeSite = { fallM: ft(5), liftM: ft(30), drivePipe: { ...drivePipe('1'), lengthM: ft(20) } };

describe('stall check ranking: what the numbers show outranks what the symptoms suggest', () => {
  it('reads the length rule the drive pipe check uses', () => {
    // L/H 5–10: the range ram guides repeat (PRACTICE: common practice, no published source found)
    expect(PRACTICE.driveLengthToFallMin.value).toBe(5);
    expect(PRACTICE.driveLengthToFallMax.value).toBe(10);
    expect(DRIVE_PIPE_GUIDES.find((g) => g.ratio === 'L/H')?.min).toBe(5);
  });

  // every single symptom the asker may tick, and none: the drive pipe outside its rule stays first
  for (const symptoms of [[], ...SYMPTOMS.map((s) => [s])] as Symptom[][]) {
    it(`ranks a 20 ft drive pipe on a 5 ft fall first with symptoms [${symptoms.join(', ')}]`, () => {
      const r = runStallCheck({ site: shortPipeSite, symptoms }).results;
      // L/H = 20 / 5 = 4, below the 5–10 band (arithmetic; PRACTICE.driveLengthToFall*, no published source)
      expect(r.lengthToFall).toBeCloseTo(4, 6);
      expect(r.causes[0]?.code).toBe('drive-pipe-outside-range');
      expect(r.causes[0]?.fromNumbers).toBe(true);
      // a full-strength problem scores 0.6 × 1 + 0.4 × w ≥ 0.6: "strong sign" (VERDICT_LIMITS.strongCause, no source)
      expect(r.causes[0]?.score).toBeGreaterThanOrEqual(0.6);
    });
  }

  it('ranks the same site inside the band below the causes the symptoms point to', () => {
    // 30 ft on 5 ft: L/H = 6, inside 5–10 (arithmetic; PRACTICE, no published source)
    const site = { ...shortPipeSite, drivePipe: { ...drivePipe('1'), lengthM: ft(30) } };
    const r = runStallCheck({ site, symptoms: ['hammering'] }).results;
    expect(r.causes.find((c) => c.code === 'drive-pipe-outside-range')).toBeUndefined();
    expect(r.causes[0]?.code).toBe('waterlogged-air-chamber');
  });

  it('does not rule out drive-pipe fittings the site sheet leaves unsaid', () => {
    // a question's site sheet may say nothing of elbows: that is unknown, not "none"
    const r = runStallCheck({ site: shortPipeSite, symptoms: ['weak-delivery'] }).results;
    const fittings = r.causes.find((c) => c.code === 'fittings-in-drive-pipe');
    expect(fittings?.fromNumbers).toBe(false);
    // unknown: 0.5 × w, w = 0.5 for weak delivery (stallCauses.ts weights, common practice, no source)
    expect(fittings?.score).toBeCloseTo(0.25, 3);
  });

  it('writes its reasons with their numbers as quantities, for the reader’s units', () => {
    const r = runStallCheck({ site: shortPipeSite, symptoms: ['never-starts'] }).results;
    const c = r.causes[0]!;
    // 20 ft = 6.096 m (NIST SP 811, 1 ft = 0.3048 m exactly)
    expect(c.reasonParts).toContainEqual({ kind: 'length', si: expect.closeTo(6.096, 6) });
    expect(c.reason).toMatch(/6\.1 m/);
  });
});
