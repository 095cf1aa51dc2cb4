import { describe, expect, it } from 'vitest';
import { asWritten, fromSI, roundAsWritten, toSI, UNIT_CHOICES } from '@/lib/hydraulics';
import { CALCULATORS, CALCULATOR_IDS, convertState, initialState, shareQuery } from '@/lib/calculators';
import { formatQuantity } from '@/lib/calculators';

/** Every unit a picker offers that belongs to the other system, for the "never opens on" checks. */
const US_ONLY = /(^|\/)(ft|in|gal|cup|psi|yd|tempF|acre)(\^\d)?(\/|$)/;
const METRIC_ONLY = /(^|\/)(m|mm|cm|L|mL|kPa|Pa|MPa|bar|tempC|hectare)(\^\d)?(\/|$)/;

describe('roundAsWritten: a converted value as a tape or gauge gives it', () => {
  it('metres to the centimetre under 5 m, to the decimetre above', () => {
    // 2 ft, 4 ft, 24 ft, 29 ft at 0.3048 m/ft (NIST SP 811, 2008); cm and dm steps: common practice, no source
    expect(roundAsWritten(fromSI(toSI(2, 'ft', 'length'), 'm', 'length'), 'm', 'length')).toBe(0.61);
    expect(roundAsWritten(fromSI(toSI(4, 'ft', 'length'), 'm', 'length'), 'm', 'length')).toBe(1.22);
    expect(roundAsWritten(fromSI(toSI(24, 'ft', 'length'), 'm', 'length'), 'm', 'length')).toBe(7.3);
    expect(roundAsWritten(fromSI(toSI(29, 'ft', 'length'), 'm', 'length'), 'm', 'length')).toBe(8.8);
    // 500 ft = 152.4 m; whole metres past 100 m: common practice, no source
    expect(roundAsWritten(152.4, 'm', 'length')).toBe(152);
  });

  it('feet to a tenth under 10 ft, whole feet above', () => {
    // 0.6 m = 1.9685 ft, 4 m = 13.12 ft (NIST SP 811, 2008); steps: common practice, no source
    expect(roundAsWritten(fromSI(0.6, 'ft', 'length'), 'ft', 'length')).toBe(2);
    expect(roundAsWritten(fromSI(4, 'ft', 'length'), 'ft', 'length')).toBe(13);
    expect(roundAsWritten(fromSI(1.5, 'ft', 'length'), 'ft', 'length')).toBe(4.9);
  });

  it('inches to the eighth, millimetres whole', () => {
    // 25 mm = 0.984 in, 20 mm = 0.787 in (1 in = 25.4 mm, NIST SP 811); eighths: common practice, no source
    expect(roundAsWritten(fromSI(0.025, 'in', 'smallLength'), 'in', 'smallLength')).toBe(1);
    expect(roundAsWritten(fromSI(0.02, 'in', 'smallLength'), 'in', 'smallLength')).toBe(0.75);
    // ¾ in = 19.05 mm (NIST SP 811); whole mm: common practice, no source
    expect(roundAsWritten(19.05, 'mm', 'smallLength')).toBe(19);
    // a pipe roughness of 0.0015 mm keeps its two figures rather than rounding to nothing: common practice, no source
    expect(roundAsWritten(0.0015, 'mm', 'smallLength')).toBe(0.0015);
  });

  it('flows and volumes to two significant figures under 10, three above', () => {
    // 2 US gal/min = 7.5708 L/min (1 US gal = 3.785411784 L, NIST Handbook 44 App. C); figures: common practice, no source
    expect(roundAsWritten(fromSI(toSI(2, 'gal/min', 'flow'), 'L/min', 'flow'), 'L/min', 'flow')).toBe(7.6);
    // 800 L/day = 211.34 US gal/day (same definition)
    expect(
      roundAsWritten(fromSI(toSI(800, 'L/day', 'dailyVolume'), 'gal/day', 'dailyVolume'), 'gal/day', 'dailyVolume'),
    ).toBe(211);
    // 10 °C = 50 °F (NIST SP 811, 2008, 4.2.1.1); whole degrees: common practice, no source
    expect(roundAsWritten(fromSI(10, 'tempF', 'temperature'), 'tempF', 'temperature')).toBe(50);
  });
});

describe('asWritten: the unit an input opens on', () => {
  it('gives small flows in gallons or litres per hour or minute, never cups or millilitres', () => {
    // 0.5 US gal/min = 30 US gal/h = 1.89 L/min (NIST Handbook 44 App. C)
    const si = toSI(0.5, 'gal/min', 'smallFlow');
    expect(asWritten('smallFlow', si, 'US')).toMatchObject({ value: 30, unit: 'gal/h' });
    expect(asWritten('smallFlow', si, 'metric')).toMatchObject({ value: 1.9, unit: 'L/min' });
    // 0.5 L/min = 30 L/h (1 h = 60 min)
    expect(asWritten('smallFlow', toSI(0.5, 'L/min', 'smallFlow'), 'metric')).toMatchObject({ value: 30, unit: 'L/h' });
  });
});

describe('calculator inputs open on the reader’s units', () => {
  it.each(CALCULATOR_IDS)('%s: a metric reader gets no US unit, a US reader no metric one', (id) => {
    const def = CALCULATORS[id];
    for (const [system, foreign] of [
      ['metric', US_ONLY],
      ['US', METRIC_ONLY],
    ] as const) {
      const state = initialState(def.fields, {}, def.defaults, system);
      for (const f of def.fields) {
        if (f.type !== 'quantity') continue;
        const unit = state[f.name]?.unit ?? '';
        expect(unit, `${id} ${f.name} (${system})`).not.toMatch(foreign);
        expect(unit, `${id} ${f.name} (${system})`).not.toMatch(/^(cup\/min|mL\/min)$/);
        expect(f.units ?? UNIT_CHOICES[f.qty], `${id} ${f.name} offers ${unit}`).toContain(unit);
      }
    }
  });

  it('opens the yield estimate’s defaults as a metric tape gives them', () => {
    const def = CALCULATORS['yield-estimate'];
    const s = initialState(def.fields, {}, def.defaults, 'metric');
    // 4 ft = 1.22 m, 29 ft = 8.8 m, 2 US gal/min = 7.6 L/min (NIST SP 811; Handbook 44); rounding: common practice, no source
    expect(s.fallM).toEqual({ text: '1.22', unit: 'm' });
    expect(s.liftM).toEqual({ text: '8.8', unit: 'm' });
    expect(s.driveFlowM3s).toEqual({ text: '7.6', unit: 'L/min' });
    expect(s.measuredDeliveredFlowM3s).toEqual({ text: '', unit: 'L/h' });
  });

  it('keeps a share link exactly as typed', () => {
    const def = CALCULATORS['yield-estimate'];
    const s = initialState(def.fields, { fall: '4 ft' }, def.defaults, 'metric', 'defaults');
    expect(s.fallM).toEqual({ text: '4', unit: 'ft' });
    const q = shareQuery(def.fields, initialState(def.fields, {}, def.defaults, 'US'));
    expect(q.get('fall')).toBe('4 ft');
  });

  it('re-expresses a switch of units and back without drift', () => {
    const def = CALCULATORS['yield-estimate'];
    const us = initialState(def.fields, {}, def.defaults, 'US');
    const metric = convertState(def.fields, us, 'metric');
    // 4 ft → 1.22 m → 4 ft (1.22 / 0.3048 = 4.003 ft, to the tenth 4.0): common practice, no source
    expect(convertState(def.fields, metric, 'US').fallM).toEqual({ text: '4', unit: 'ft' });
  });
});

describe('formatQuantity: results never in e-notation', () => {
  it('writes tiny and huge values in plain digits', () => {
    // 1e-9 m³/s = 0.0036 L/h (1 m³ = 1000 L, 1 h = 3600 s)
    expect(formatQuantity('smallFlow', 1e-9, 'metric')).toBe('0.0036 L/h');
    // 1e5 m³ = 100,000,000 L; a result reads grouped, never 1e+8
    expect(formatQuantity('volume', 1e5, 'metric')).not.toMatch(/e[+-]?\d/i);
  });
});
