// @vitest-environment happy-dom
import { afterEach, describe, expect, it, vi } from 'vitest';
import { cleanup, screen } from '@testing-library/react';
import { CALCULATORS } from '@/lib/calculators';
import { UNITS_COOKIE } from '@/lib/units/preference';

vi.mock('next/navigation', () => ({ useRouter: () => ({ refresh: () => {}, push: () => {} }) }));
const { CalculatorCard } = await import('@/components/calculators/kit/CalculatorCard');
const { renderWithUnits } = await import('../support/render-with-units');

afterEach(() => {
  cleanup();
  document.cookie = `${UNITS_COOKIE}=; max-age=0; path=/`;
});

const card = () => renderWithUnits(<CalculatorCard def={CALCULATORS['source-flow']} />);

/** Bucket trials are free text the unit switch cannot re-express: each reader starts from trials in their own units. */
describe('the source flow card’s bucket trials', () => {
  it('open in litres for a metric reader, with a metric example', () => {
    document.cookie = `${UNITS_COOKIE}=metric; path=/`;
    card();
    const box = screen.getByLabelText('Trials') as HTMLInputElement;
    expect(box.value).toBe('10 L in 22 s, 10 L in 21 s, 10 L in 23 s');
    expect(box.placeholder).not.toMatch(/gal/);
  });

  it('open in US gallons for a US reader', () => {
    document.cookie = `${UNITS_COOKIE}=US; path=/`;
    card();
    const box = screen.getByLabelText('Trials') as HTMLInputElement;
    expect(box.value).toMatch(/^5 gal in 42 s/);
    expect(box.placeholder).not.toMatch(/\bL\b/);
  });
});
