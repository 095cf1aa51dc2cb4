/** "Show the working" in the reader's units: the numbers put into each rule and the answer. */
import { describe, expect, it } from 'vitest';
import { checkDeliveryLine, estimateYield, measureSourceFlow, siTex, type Step } from '@/lib/hydraulics';
import { step, sub, tq } from '@/lib/hydraulics/steps';
import { stepAnswer, substitutedTex, workingLines } from '@/lib/calculators/working';
import { FALL, LIFT, deliveryLine, gpm } from '../hydraulics/fixtures';

const byTitle = (steps: Step[], title: string) => {
  const s = steps.find((x) => x.title === title);
  if (!s) throw new Error(`no step "${title}" in ${steps.map((x) => x.title).join(', ')}`);
  return s;
};

describe('the lift ratio of a 4 ft fall and a 29 ft lift', () => {
  // 4 ft of fall, 29 ft of lift, about 2 US gal/min of drive (common practice, no source)
  const out = estimateYield({ driveFlowM3s: gpm(2), fallM: FALL, liftM: LIFT });
  const ratio = byTitle(out.steps, 'Lift ratio');

  it('reads in feet for a US reader', () => {
    const tex = substitutedTex(ratio, 'US');
    expect(tex).toContain('29\\,\\mathrm{ft}'); // the typed lift (common practice, no source)
    expect(tex).toContain('4\\,\\mathrm{ft}'); // the typed fall (common practice, no source)
    expect(stepAnswer(ratio, 'US')).toBe('7.25'); // 29 / 4 = 7.25 (arithmetic)
  });

  it('reads in metres for a metric reader', () => {
    const tex = substitutedTex(ratio, 'metric');
    expect(tex).toContain('8.84\\,\\mathrm{m}'); // 29 ft × 0.3048 m/ft = 8.8392 m (NIST SP 811, 2008, exact foot)
    expect(tex).toContain('1.22\\,\\mathrm{m}'); // 4 ft × 0.3048 m/ft = 1.2192 m (NIST SP 811, 2008)
    expect(stepAnswer(ratio, 'metric')).toBe('7.25'); // a ratio does not change with units (arithmetic)
  });

  it('the engine still carries SI for checks against references', () => {
    expect(siTex(ratio.substituted)).toBe('r = \\frac{8.839\\,\\mathrm{m}}{1.219\\,\\mathrm{m}}'); // NIST SP 811, 2008
  });
});

describe('velocity in 100 ft of ½-inch schedule 40 PVC carrying 2 US gal/min', () => {
  // ½" sch 40 PVC has a 0.622 in bore (ASTM D1785 dimensions table, from memory)
  const out = checkDeliveryLine({ flowM3s: gpm(2), liftM: LIFT, line: deliveryLine('1/2', 100) });
  const velocity = byTitle(out.steps, 'Velocity');

  it('US: gallons a minute, inches of bore, feet a second', () => {
    const tex = substitutedTex(velocity, 'US');
    expect(tex).toContain('2\\,\\mathrm{US\\ gal/min}'); // the drive flow as typed (common practice, no source)
    expect(tex).toContain('0.622\\,\\mathrm{in}'); // ASTM D1785, from memory
    // v = 0.4085 Q/d² = 0.4085 × 2 / 0.622² = 2.11 ft/s (Crane TP-410, 1988, eq. 3-2, from memory)
    expect(stepAnswer(velocity, 'US')).toBe('2.11 ft/s');
  });

  it('metric: litres a minute, millimetres of bore, metres a second', () => {
    const tex = substitutedTex(velocity, 'metric');
    expect(tex).toContain('7.57\\,\\mathrm{L/min}'); // 2 × 3.785411784 L = 7.571 L (NIST SP 811, 2008)
    expect(tex).toContain('15.8\\,\\mathrm{mm}'); // 0.622 in × 25.4 mm/in = 15.80 mm (NIST SP 811, 2008)
    // 2.112 ft/s × 0.3048 = 0.6437 m/s (Crane TP-410 as above; NIST SP 811 for the foot)
    expect(stepAnswer(velocity, 'metric')).toBe('0.644 m/s');
  });

  it('no number in any step is written in e-notation, and flows are never in m³/s but for Hazen-Williams', () => {
    for (const units of ['US', 'metric'] as const)
      for (const l of workingLines(out.steps, units)) {
        expect(l.substituted + l.answer).not.toMatch(/\de[-+]?\d|\\times ?10\^/);
        // Hazen-Williams' constant 10.67 only holds in metres and m³/s, so that rule keeps them
        if (!l.title.includes('Hazen-Williams')) expect(l.substituted).not.toMatch(/m\^\{3\}\/s/);
      }
  });
});

describe('one unit per kind within a step', () => {
  it('a sum of heads reads in feet throughout, not feet plus inches', () => {
    // 29 ft of lift plus 0.36 in (0.00914 m) of friction: 0.00914 m ÷ 0.3048 = 0.0300 ft (NIST SP 811, 2008)
    const s = step(
      'Head at the pump',
      'h_p = h + h_f',
      sub`h_p = ${tq(8.8392, 'm')} + ${tq(0.00914, 'm')}`,
      8.84834,
      'm',
    );
    expect(substitutedTex(s, 'US')).toBe('h_p = 29\\,\\mathrm{ft} + 0.03\\,\\mathrm{ft}');
    expect(substitutedTex(s, 'metric')).toBe('h_p = 8.84\\,\\mathrm{m} + 0.00914\\,\\mathrm{m}');
  });
});

describe('the hydraulic power rule’s constants in the reader’s system', () => {
  // 4 ft of fall, 29 ft of lift, about 2 US gal/min of drive (common practice, no source)
  const out = estimateYield({ driveFlowM3s: gpm(2), fallM: FALL, liftM: LIFT });
  const power = byTitle(out.steps, 'Hydraulic power in');

  it('US: water at 62.4 lb/ft³ and gravity at 32.2 ft/s², nothing metric', () => {
    const tex = substitutedTex(power, 'US');
    // 1,000 kg/m³ = 62.43 lb/ft³; 9.81 m/s² ÷ 0.3048 = 32.19 ft/s² (NIST SP 811, 2008: exact foot and pound)
    expect(tex).toContain('62.4\\,\\mathrm{lb/ft^{3}}');
    expect(tex).toContain('32.2\\,\\mathrm{ft/s^{2}}');
    expect(tex).not.toMatch(/kg|m\/s|\\mathrm\{m/);
  });

  it('metric: 1,000 kg/m³ and 9.81 m/s² as the rule is written', () => {
    const tex = substitutedTex(power, 'metric');
    // water about 1,000 kg/m³, g = 9.81 m/s² (common practice, no source)
    expect(tex).toContain('1{,}000\\,\\mathrm{kg/m^{3}}');
    expect(tex).toContain('9.81\\,\\mathrm{m/s^{2}}');
  });
});

describe('a 90° V-notch with 0.5 ft of head: the weir rules in each system', () => {
  // 0.5 ft = 0.1524 m of head (NIST SP 811, 2008, exact foot)
  const out = measureSourceFlow({ method: 'v-notch', notchHeadM: 0.1524 });
  const lines = (units: 'US' | 'metric') => workingLines(out.steps, units);

  it('a metric reader gets the rules written in metres, no feet', () => {
    const text = lines('metric')
      .map((l) => `${l.formula} ${l.substituted} ${l.note ?? ''}`)
      .join(' ');
    expect(text).not.toMatch(/ft/);
    // 8/15 × √(2 × 9.81) = 2.36 (Bos, Discharge Measurement Structures, 1989: the V-notch rule); 2.49 × 0.3048^0.52 = 1.34 (USBR Water Measurement Manual, 2001)
    expect(text).toContain('Q = 2.36');
    expect(text).toContain('Q = 1.34');
  });

  it('the metric rules give the engine’s flows: USBR 90° at 0.1524 m is 1.34 × 0.1524^2.48', () => {
    // 1.34 × 0.1524^2.48 = 0.01260 m³/s, within the rounding of the constant (arithmetic from the USBR rule)
    expect(out.results.weir?.usbr90M3s).toBeCloseTo(1.34 * 0.1524 ** 2.48, 4);
  });

  it('a US reader keeps the rules as published, in feet', () => {
    const ks = lines('US').find((l) => l.title.startsWith('V-notch'));
    expect(ks?.formula).toContain('4.28');
    expect(ks?.substituted).toContain('0.5\\,\\mathrm{ft}'); // 0.1524 m ÷ 0.3048 = 0.5 ft (NIST SP 811, 2008)
  });
});
