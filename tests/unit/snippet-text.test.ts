/** The words search and e-mail show: rendered text in the reader's units, never markup or codes. */
import { describe, expect, it } from 'vitest';
import { markdownToPlain, texToPlain } from '@/lib/search/plain-text';
import { quantitiesInUnits, withReadings } from '@/lib/units/in-text';
import { siteSheetText } from '@/lib/search/documents';
import { entryTitle } from '@/lib/field-log/title';

describe('quantities in text, in the reader’s units', () => {
  it('metric to US', () => {
    // 1.5 m = 4.921 ft, 16.6 m = 54.46 ft (NIST SP 811, 2008: 1 ft = 0.3048 m exactly)
    expect(quantitiesInUnits('1.5 m fall, 16.6 m lift', 'US')).toBe('4.92 ft fall, 54.5 ft lift');
    // 20 L/min ÷ 3.785411784 = 5.283 US gal/min (NIST SP 811, 2008)
    expect(quantitiesInUnits('about 20 L/min through 90 metres', 'US')).toBe('about 5.28 US gal/min through 295 ft');
  });
  it('bucket volumes', () => {
    // 2 L ÷ 3.785411784 L/gal = 0.528 US gal; 5 gal × 3.785411784 = 18.93 L (NIST SP 811, 2008)
    expect(quantitiesInUnits('bucket trials 2 L in 31.6 s', 'US')).toBe('bucket trials 0.528 US gal in 31.6 s');
    expect(quantitiesInUnits('a 5 gallon bucket', 'metric')).toBe('a 18.9 L bucket');
  });
  it('US to metric, grouped thousands and pressure', () => {
    // 1,200 ft × 0.3048 = 365.8 m; 60 psi × 6.894757 kPa/psi = 413.7 kPa (NIST SP 811, 2008)
    expect(quantitiesInUnits('a 1,200 ft line at 60 psi', 'metric')).toBe('a 366 m line at 414 kPa');
    // 0.25 gal/min = 56.78 L/h: under a litre a minute reads per hour (NIST SP 811, 2008; common practice, no source)
    expect(quantitiesInUnits('only 0.25 gpm', 'metric')).toBe('only 56.8 L/h');
  });
  it('leaves the reader’s own system, nominal inch sizes and minutes alone', () => {
    expect(quantitiesInUnits('29 ft of lift', 'US')).toBe('29 ft of lift');
    expect(quantitiesInUnits('a 1-1/4 inch pump beats for 5 min', 'metric')).toBe('a 1-1/4 inch pump beats for 5 min');
    expect(quantitiesInUnits('2 × 1 inch homemade pumps in parallel', 'metric')).toBe(
      '2 × 1 inch homemade pumps in parallel',
    );
    expect(quantitiesInUnits('pump size 2 in', 'metric')).toBe('pump size 2 in');
  });
  it('measured inches are converted, by size', () => {
    // 0.622 in × 25.4 = 15.80 mm; 288 in × 0.0254 = 7.315 m; 14 in × 25.4 = 355.6 mm (NIST SP 811, 2008: 1 in = 25.4 mm exactly)
    expect(quantitiesInUnits('inside diameter 0.622 in, a run of 288 in', 'metric')).toBe(
      'inside diameter 15.8 mm, a run of 7.32 m',
    );
    expect(quantitiesInUnits('Lowered the intake box 14 inches below', 'metric')).toBe(
      'Lowered the intake box 356 mm below',
    );
  });
  it('millilitres a minute', () => {
    // 850 mL/min × 60 ÷ 3,785.411784 mL/gal = 13.47 US gal/h (NIST SP 811, 2008)
    expect(quantitiesInUnits('Delivered 850 mL/min', 'US')).toBe('Delivered 13.5 US gal/h');
  });
  it('a member’s words kept, with the reader’s reading in brackets', () => {
    // 9 mm ÷ 25.4 = 0.354 in; 20 L ÷ 3.785411784 = 5.28 US gal (NIST SP 811, 2008)
    expect(withReadings('stroke 9 mm, one washer, a 20 L bucket', 'US')).toBe(
      'stroke 9 mm (0.354 in), one washer, a 20 L (5.28 US gal) bucket',
    );
    expect(withReadings('2 in parallel, 29 ft of lift', 'US')).toBe('2 in parallel, 29 ft of lift');
  });
});

describe('Markdown and TeX as rendered words', () => {
  it('drops emphasis, list dashes, headings and link targets', () => {
    expect(markdownToPlain('## Fix\n**Check** the _waste valve_:\n\n- one [guide](/guides/x)\n- two')).toBe(
      'Fix\nCheck the waste valve:\none guide\ntwo',
    );
  });
  it('reads formulas as a person would write them in a line of text', () => {
    expect(texToPlain('\\eta = \\frac{q\\,h}{Q\\,H}')).toBe('η = (q h)/(Q H)');
    expect(markdownToPlain('loss $h_f = f\\frac{L}{D}$ here')).toBe('loss hf = f L/D here');
  });
  it('keeps a dollar amount that is not a formula', () => {
    expect(markdownToPlain('it cost $5 or $6 in fittings')).toBe('it cost $5 or $6 in fittings');
  });
});

describe('site sheet and field log words', () => {
  it('site sheet codes read as words', () => {
    const t = siteSheetText({ driveMaterial: 'pvc-sch40', symptoms: 'weak-delivery,never-starts', driveSize: '1-1/4' });
    expect(t).toContain('Drive pipe material PVC, schedule 40');
    expect(t).toContain('weak delivery');
    expect(t).toContain('Drive pipe size 1-1/4 inch');
    expect(t).not.toMatch(/pvc-sch40|weak-delivery/);
  });
  it('a field log title is drawn in each reader’s units', () => {
    const e = { siteName: 'Hollin brook', pumpType: 'homemade', pumpSize: '1', pumpCount: 1, arrangement: 'single' };
    // 1.5 m and 16.6 m of head (the demo's invented site), 4.921 ft and 54.46 ft (NIST SP 811, 2008)
    expect(entryTitle({ ...e, fallM: 1.5, liftM: 16.6 }, 'US')).toBe(
      'Hollin brook: 1 inch homemade pump, 4.92 ft fall, 54.5 ft lift',
    );
    expect(entryTitle({ ...e, fallM: 1.5, liftM: 16.6 }, 'metric')).toBe(
      'Hollin brook: 1 inch homemade pump, 1.5 m fall, 16.6 m lift',
    );
  });
});
