import { describe, expect, it } from 'vitest';
import { CALCULATORS, computeFromForm, initialState, readForm } from '@/lib/calculators';
import { fromSI, type DrivePipeCheckResults } from '@/lib/hydraulics';

const dpc = CALCULATORS['drive-pipe-check'];

describe('pipe pickers by the reader’s units', () => {
  it('a metric reader starts from EN 1452 PVC-U, a US reader from schedule 40', () => {
    const us = initialState(dpc.fields, {}, dpc.defaults, 'US');
    const metric = initialState(dpc.fields, {}, dpc.defaults, 'metric');
    expect(us['drivePipe.series']?.text).toBe('pvc-sch40');
    expect(us['drivePipe.nominal']?.text).toBe('1/2');
    expect(metric['drivePipe.series']?.text).toBe('pvcu-sdr13.6');
    // 1/2" sch 40 has a 15.8 mm bore (ASTM D1785); 20 mm SDR 13.6 a 17.0 mm bore (EN 1452-2, walls OD/SDR) is the nearest
    expect(metric['drivePipe.nominal']?.text).toBe('20mm');
  });

  it('a form that names its pipe keeps it, whatever the reader’s units', () => {
    const saved = { material: 'pvc-sch80', size: '3/4' };
    const metric = initialState(dpc.fields, saved, dpc.defaults, 'metric');
    expect(metric['drivePipe.series']?.text).toBe('pvc-sch80');
    expect(metric['drivePipe.nominal']?.text).toBe('3/4');
  });

  it('computes a metric pipe from its series and outside diameter', () => {
    const r = computeFromForm('drive-pipe-check', { material: 'pe100-sdr11', size: '32 mm' });
    if (!r.ok) throw new Error(r.message);
    const res = r.output.results as DrivePipeCheckResults;
    // 32 mm PE100 SDR 11: PN 16 bar, wall 3.0 mm (ISO 4427-2:2007)
    expect(fromSI(res.pressureRatingPa, 'bar', 'pressure')).toBeCloseTo(16, 6);
    expect(res.lengthToDiameter).toBeCloseTo((24 * 0.3048) / 0.026, 3);
  });

  it('refuses a size of the other system, naming the size field', () => {
    const r = computeFromForm('drive-pipe-check', { material: 'pe100-sdr11', size: '1/2' });
    expect(r.ok).toBe(false);
    expect(!r.ok && r.field).toBe('size');
    const state = initialState(dpc.fields, { material: 'pvc-sch40', size: '25mm' }, dpc.defaults, 'US');
    expect(() => dpc.toInput?.(readForm(dpc.fields, state).values)).toThrow(/nominal size in inches/);
  });
});
