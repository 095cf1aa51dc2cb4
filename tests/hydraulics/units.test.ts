import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { unit as mathUnit } from 'mathjs';
import {
  EngineInputError,
  UNIT_CHOICES,
  fieldFromDisplay,
  fieldToDisplay,
  fromDisplay,
  fromSI,
  kindOfField,
  parseQuantity,
  toDisplay,
  toSI,
  type QuantityKind,
} from '@/lib/hydraulics';

describe('exact conversion factors', () => {
  it('1 ft = 0.3048 m', () => {
    // NIST SP 811 (2008), Appendix B.8: foot = 3.048 E-01 m (exact)
    expect(toSI(1, 'ft', 'length')).toBe(0.3048);
  });
  it('1 in = 0.0254 m', () => {
    // NIST SP 811 (2008), Appendix B.8: inch = 2.54 E-02 m (exact)
    expect(toSI(1, 'in', 'smallLength')).toBeCloseTo(0.0254, 15);
  });
  it('1 US gallon = 3.785411784 L', () => {
    // NIST SP 811 (2008), B.8: gallon (U.S.) = 3.785 411 784 E-03 m³ (exact, 231 in³); NIST Handbook 44 App. C
    expect(toSI(1, 'gal', 'volume') * 1000).toBeCloseTo(3.785411784, 12);
  });
  it('1 US cup = 236.5882365 mL', () => {
    // NIST Handbook 44 (2024), Appendix C: 1 cup = 8 fluid ounces = 236.588 236 5 mL (exact); also 1/16 gallon
    expect(toSI(1, 'cup', 'volume') * 1e6).toBeCloseTo(236.5882365, 9);
  });
  it('1 psi = 6894.757 Pa', () => {
    // NIST SP 811 (2008), B.8: pound-force per square inch = 6.894 757 E+03 Pa
    expect(toSI(1, 'psi', 'pressure')).toBeCloseTo(6894.757, 3);
  });
  it('1 US gal/min = 6.309019640e-5 m³/s', () => {
    // derived from NIST SP 811 B.8 gallon (exact) ÷ 60 s: 3.785411784e-3/60 = 6.30901964e-5 (arithmetic)
    expect(toSI(1, 'gal/min', 'flow')).toBeCloseTo(6.30901964e-5, 15);
  });
});

describe('js-quantities cross-checked against mathjs units', () => {
  // mathjs 15 units — an independent general-purpose library (mathjs.org, Unit reference)
  const cases: [number, string, QuantityKind, string, string][] = [
    [4, 'ft', 'length', 'ft', 'm'],
    [0.75, 'in', 'smallLength', 'inch', 'm'],
    [2, 'gal/min', 'flow', 'gal/minute', 'm^3/s'],
    [500, 'mL/min', 'flow', 'mL/minute', 'm^3/s'],
    [1.5, 'L/s', 'flow', 'L/s', 'm^3/s'],
    [3, 'cup/min', 'flow', 'cup/minute', 'm^3/s'],
    [40, 'psi', 'pressure', 'psi', 'Pa'],
    [250, 'kPa', 'pressure', 'kPa', 'Pa'],
    [2, 'bar', 'pressure', 'bar', 'Pa'],
    [10, 'gal', 'volume', 'gal', 'm^3'],
  ];
  for (const [v, u, kind, mu, msi] of cases) {
    it(`${v} ${u}`, () => {
      const ours = toSI(v, u, kind);
      const theirs = mathUnit(v, mu).toNumber(msi);
      expect(Math.abs(ours / theirs - 1)).toBeLessThan(1e-9);
    });
  }
});

describe('parseQuantity', () => {
  it.each([
    ['4 ft', 'length', 1.2192], // 4 × 0.3048 (NIST SP 811)
    ["4'", 'length', 1.2192], // same, foot mark
    ['1.2 m', 'length', 1.2],
    ['2 gpm', 'flow', 1.261803928e-4], // 2 × 231 in³ × 0.0254³ / 60 s (NIST SP 811)
    ['500 mL/min', 'flow', 8.333333333e-6], // 0.5 L / 60 s
    ['3 cups/min', 'flow', 1.18294118e-5], // 3 × 236.5882365 mL / 60 s (NIST HB 44)
    ['40 psi', 'pressure', 275790.29], // 40 × 6894.757 Pa (NIST SP 811)
    ['3/4 in', 'smallLength', 0.01905], // 0.75 × 0.0254
    ['¾"', 'smallLength', 0.01905],
    ['1 1/4 in', 'smallLength', 0.03175],
    ['1¼"', 'smallLength', 0.03175],
    ['1,000 gal', 'volume', 3.785411784], // thousands separator
    ['2.5 L/s', 'flow', 0.0025],
  ] as const)('%s', (text, kind, si) => {
    // check values carry 7+ significant figures, so compare to 1 part in 10⁶
    expect(Math.abs(parseQuantity(text, kind) / si - 1)).toBeLessThan(1e-6);
  });

  it('accepts a number with its unit', () => {
    expect(parseQuantity({ value: 2, unit: 'gal/min' }, 'flow')).toBeCloseTo(1.261803928e-4, 13);
  });

  it('throws a typed error naming the field', () => {
    const bad = () => parseQuantity('four feet', 'length', 'fallM');
    expect(bad).toThrow(EngineInputError);
    try {
      bad();
    } catch (e) {
      expect((e as EngineInputError).field).toBe('fallM');
    }
    expect(() => parseQuantity('4 psi', 'length', 'fallM')).toThrow(/fallM: "psi" is not a unit of length/);
    expect(() => parseQuantity('4', 'length', 'fallM')).toThrow(/needs a unit/);
    expect(() => parseQuantity({ value: Number.NaN, unit: 'ft' }, 'length', 'fallM')).toThrow(EngineInputError);
  });
});

describe('display helpers', () => {
  it('converts SI to US and metric display units and back', () => {
    expect(toDisplay('flow', 1.261803928e-4, 'US').value).toBeCloseTo(2, 9);
    expect(toDisplay('flow', 1.261803928e-4, 'US').label).toBe('US gal/min');
    expect(toDisplay('pressure', 275790.29, 'metric')).toMatchObject({ unit: 'kPa' });
    expect(fromDisplay('length', 4, 'US')).toBeCloseTo(1.2192, 12);
    expect(fromDisplay('smallLength', 25.4, 'metric')).toBeCloseTo(0.0254, 12);
    expect(toDisplay('temperature', 10, 'US').value).toBeCloseTo(50, 9); // 10 °C = 50 °F (definition of the scales)
  });

  it('knows the kind of each field from its name', () => {
    expect(kindOfField('fallM')).toBe('length');
    expect(kindOfField('drivePipe.insideDiameterM')).toBe('smallLength');
    expect(kindOfField('driveFlowM3s')).toBe('flow');
    expect(kindOfField('surgePa')).toBe('pressure');
    expect(kindOfField('youngsModulusPa')).toBe('modulus');
    expect(kindOfField('deliveredPerDayM3PerDay')).toBe('dailyVolume');
    expect(kindOfField('gardenAreaM2')).toBe('area');
    expect(kindOfField('waterTempC')).toBe('temperature');
    expect(kindOfField('liftRatio')).toBeUndefined();
    expect(fieldToDisplay('liftM', 8.8392, 'US').value).toBeCloseTo(29, 9);
    expect(fieldFromDisplay('fallM', 4, 'US')).toBeCloseTo(1.2192, 12);
  });

  it('every unit offered in a picker converts', () => {
    for (const [kind, units] of Object.entries(UNIT_CHOICES) as [QuantityKind, readonly string[]][]) {
      for (const u of units) {
        if (kind === 'dimensionless') continue;
        expect(Number.isFinite(toSI(1, u, kind))).toBe(true);
      }
    }
  });
});

describe('round trips', () => {
  // property: converting to a display unit and back returns the input (floating-point tolerance)
  const kinds: QuantityKind[] = [
    'length',
    'smallLength',
    'flow',
    'smallFlow',
    'volume',
    'dailyVolume',
    'pressure',
    'velocity',
    'area',
    'temperature',
  ];
  it('SI → display → SI', () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...kinds),
        fc.constantFrom('US' as const, 'metric' as const),
        fc.double({ min: 1e-6, max: 1e6, noNaN: true }),
        (kind, system, si) => {
          const back = fromDisplay(kind, toDisplay(kind, si, system).value, system);
          expect(Math.abs(back - si)).toBeLessThanOrEqual(1e-9 * Math.max(1, Math.abs(si)));
        },
      ),
    );
  });
  it('unit → SI → unit for every picker unit', () => {
    fc.assert(
      fc.property(fc.constantFrom(...kinds), fc.double({ min: 1e-6, max: 1e6, noNaN: true }), (kind, x) => {
        for (const u of UNIT_CHOICES[kind]) {
          expect(fromSI(toSI(x, u, kind), u, kind)).toBeCloseTo(x, 6);
        }
      }),
      { numRuns: 50 },
    );
  });
});
