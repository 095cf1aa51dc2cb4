// @vitest-environment happy-dom
import { afterEach, describe, expect, it } from 'vitest';
import { cleanup, fireEvent, render, screen, within } from '@testing-library/react';
import {
  CALCULATOR_IDS,
  CALCULATORS as calculatorDefs,
  computeFromForm,
  convertState,
  initialState,
  readForm,
  shareQuery,
} from '@/lib/calculators';
import { CalculatorCard } from '@/components/calculators/kit/CalculatorCard';

afterEach(cleanup);

/** An input per calculator to change, and a value it should accept. */
const EDIT: Record<string, { label: RegExp; value: string }> = {
  'yield-estimate': { label: /^Lift \(delivery head\)$/, value: '40' },
  'array-planner': { label: /^Pumps/, value: '3' },
  'drive-pipe-check': { label: /^Drive pipe length$/, value: '40' },
  'delivery-line': { label: /^Delivery line length$/, value: '600' },
  'source-flow': { label: /^Trials$/, value: '5 gal in 30 s, 5 gal in 31 s' },
  'demand-and-storage': { label: /^Sheep$/, value: '120' },
  'stall-check': { label: /^Drive pipe length$/, value: '40' },
};

describe('calculator cards', () => {
  it.each(CALCULATOR_IDS)('%s mounts with its defaults and recomputes when an input changes', (id) => {
    const def = calculatorDefs[id];
    render(<CalculatorCard def={def} />);
    const results = screen.getByTestId(`${id}-results`);
    const before = results.textContent;
    expect(within(results).queryByText(/Fix the fields/)).toBeNull();
    const edit = EDIT[id];
    fireEvent.change(screen.getByLabelText(edit.label), { target: { value: edit.value } });
    expect(screen.getByTestId(`${id}-results`).textContent).not.toBe(before);
  });

  it('puts the engine’s message beside a field it refuses, naming the field', () => {
    render(<CalculatorCard def={calculatorDefs['yield-estimate']} />);
    fireEvent.change(screen.getByLabelText(/^Lift \(delivery head\)$/), { target: { value: '3' } });
    const alert = screen.getByRole('alert');
    expect(alert.textContent).toMatch(/^Lift \(delivery head\): must be greater than the fall/);
    fireEvent.change(screen.getByLabelText(/^Fall \(supply head\)$/), { target: { value: 'four' } });
    expect(
      screen
        .getAllByRole('alert')
        .map((a) => a.textContent)
        .join(' '),
    ).toMatch(/Fall \(supply head\): could not read "four"/);
  });

  it('takes an explicit unit typed into any field', () => {
    const def = calculatorDefs['yield-estimate'];
    const state = initialState(def.fields, {}, def.defaults, 'US');
    state.fallM = { text: '1.2192 m', unit: 'ft' };
    // 4 ft = 1.2192 m exactly (NIST SP 811, 2008: 1 ft = 0.3048 m)
    expect(readForm(def.fields, state).values.fallM).toBeCloseTo(1.2192, 10);
  });
});

describe('share links', () => {
  it.each(CALCULATOR_IDS)('%s: a share link reopens the same inputs and the same result', (id) => {
    const def = calculatorDefs[id];
    const state = initialState(def.fields, {}, def.defaults, 'US');
    const q = shareQuery(def.fields, state);
    const reopened = initialState(def.fields, Object.fromEntries(q.entries()), {}, 'metric');
    expect(readForm(def.fields, reopened).values).toEqual(readForm(def.fields, state).values);
    const a = computeFromForm(id, Object.fromEntries(q.entries()));
    expect(a.ok).toBe(true);
  });

  it('survives a switch of units: 4 ft becomes 1.22 m, as a tape gives it', () => {
    const def = calculatorDefs['yield-estimate'];
    const us = initialState(def.fields, { fall: '4 ft', lift: '29 ft', driveFlow: '2 gal/min' }, {}, 'US');
    const metric = convertState(def.fields, us, 'metric');
    // 4 × 0.3048 = 1.2192 m (NIST SP 811, 2008), to the centimetre (common practice, no source)
    expect(metric.fallM).toEqual({ text: '1.22', unit: 'm' });
    // 2 US gal/min × 3.785411784 L = 7.571 L/min (NIST Handbook 44, Appendix C: 1 US gallon = 231 in³),
    // to two significant figures (common practice, no source)
    expect(metric.driveFlowM3s).toEqual({ text: '7.6', unit: 'L/min' });
  });
});
