import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { guidesDir } from '@/lib/guides/content';

/**
 * The safety wording in the guides, read as a person would follow it step by step.
 * Closing the isolating valve while the ram beats lets nothing off: every beat pumps the
 * air chamber towards shut-off pressure, and the line's drain sits beyond the valve. So
 * wherever a guide tells the reader to make the pressure side safe, it must stop the pump
 * first, then isolate, then bleed the chamber through its own valve watching a gauge.
 */
const guides = readdirSync(guidesDir())
  .filter((f) => f.endsWith('.mdx'))
  .map((f) => ({ slug: f.replace(/\.mdx$/, ''), text: readFileSync(path.join(guidesDir(), f), 'utf8') }));
const sentences = (text: string) => text.split(/(?<=[.!?])\s+|\n+/);
const guide = (slug: string) => guides.find((g) => g.slug === slug)!.text;

describe('safety wording in the guides', () => {
  it('never says to let the pressure off by closing the isolating valve alone', () => {
    for (const { slug, text } of guides) {
      for (const s of sentences(text)) {
        if (/let the pressure (off|fall)|pressure (off|fall)\b/i.test(s)) throw new Error(`${slug}: "${s}"`);
      }
    }
  });

  it('makes the pressure side safe in the order stop, isolate, bleed with a gauge, wherever it asks for it', () => {
    let places = 0;
    for (const { slug, text } of guides) {
      for (const s of sentences(text.replace(/;/g, ';'))) {
        if (!/bleed valve/i.test(s) || !/isolating valve/i.test(s) || !/stop the pump/i.test(s)) continue;
        places++;
        const stop = s.search(/stop the pump/i);
        const isolate = s.search(/close the isolating valve/i);
        const bleed = s.search(/open the bleed valve/i);
        expect(stop, slug).toBeGreaterThanOrEqual(0);
        expect(isolate, `${slug}: isolate after stopping`).toBeGreaterThan(stop);
        expect(bleed, `${slug}: bleed after isolating`).toBeGreaterThan(isolate);
        expect(s, slug).toMatch(/gauge/);
      }
    }
    // how-a-ram-pump-works, first-start (caution), care (air chamber), when-it-stops (two), the-delivery-line,
    // building-a-ram-from-fittings (taking a fitting off)
    expect(places).toBeGreaterThanOrEqual(7);
  });

  it('has the bleed valve, gauge and relief valve in the build, and charges the chamber against a gauge', () => {
    expect(guide('how-a-ram-pump-works')).toMatch(/gauge and bleed valve/i);
    expect(guide('the-delivery-line')).toMatch(/pressure gauge, a bleed valve and a relief valve/);
    const start = guide('first-start-and-tuning');
    expect(start).toMatch(/relief valve set below the rating of the weakest part/);
    expect(start).not.toMatch(/beats steadily against the closed isolating valve, the air chamber is charged/);
    expect(start).toMatch(/Never let the gauge climb past that/);
  });

  it('names the hazards where they apply', () => {
    const drive = guide('the-drive-pipe');
    expect(drive).toMatch(/fatigue/);
    expect(drive).toMatch(/schedule 40 PVC must not be threaded/);
    expect(drive).toMatch(/screen the intake so fish/);
    expect(drive).toMatch(/livestock fenced off the intake/);
    const storage = guide('storage-overflow-and-float-valves');
    expect(storage).toMatch(/confined space/);
    expect(storage).toMatch(/backflow preventer/);
    expect(storage).toMatch(/rated for drinking water/);
    const care = guide('care-frost-floods-and-water-rights');
    expect(care).toMatch(/backflow preventer/);
    expect(care).toMatch(/Fence livestock off the intake/);
    expect(guide('will-a-ram-meet-my-demand')).toMatch(/backflow preventer/);
    const build = guide('building-a-ram-from-fittings');
    expect(build).toMatch(/Schedule 40 PVC must not be threaded/);
    expect(build).toMatch(/Never glass/);
    expect(build).toMatch(/relief valve set below the rating of the weakest part/);
    expect(build).toMatch(/Never loosen one, or stand over it, while the pump runs/);
    const intake = guide('the-intake-and-supply');
    expect(intake).toMatch(/Fence livestock off the intake/);
    expect(intake).toMatch(/fisheries authority/);
    expect(intake).toMatch(/water rights and permits/);
    expect(intake).toMatch(/never alone in high water/);
    expect(guide('choosing-a-pump-size')).toMatch(/water rights and permits/);
  });

  it('takes a fitting off the pump only once it is stopped, isolated, bled to zero and drained', () => {
    const s = guide('building-a-ram-from-fittings');
    const at = (re: RegExp) => s.search(re);
    // the stick holds the waste valve shut; letting it go before the drive valve is closed restarts the pump
    expect(at(/close the drive pipe's valve slowly now/)).toBeGreaterThan(at(/gauge reads zero/));
    expect(at(/only then let the waste valve go/)).toBeGreaterThan(at(/close the drive pipe's valve slowly now/));
    expect(at(/Loosen the fitting a little at a time/)).toBeGreaterThan(at(/only then let the waste valve go/));
  });
});
