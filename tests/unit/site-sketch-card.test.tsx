// @vitest-environment happy-dom
import { afterEach, describe, expect, it, vi } from 'vitest';
import { cleanup, fireEvent, render, screen } from '@testing-library/react';
import { CALCULATORS } from '@/lib/calculators';
import { UNITS_COOKIE } from '@/lib/units/preference';

vi.mock('next/navigation', () => ({ useRouter: () => ({ refresh: () => {}, push: () => {} }) }));
const { CalculatorCard } = await import('@/components/calculators/kit/CalculatorCard');
const { renderWithUnits } = await import('../support/render-with-units');

afterEach(() => {
  cleanup();
  document.cookie = `${UNITS_COOKIE}=; max-age=0; path=/`;
});

const sketchName = () => screen.getByRole('img', { name: /^Site sketch:/ }).getAttribute('aria-label') ?? '';

describe('the site sketch in a calculator card', () => {
  it('reads the card’s form in the reader’s units and follows what is typed', () => {
    document.cookie = `${UNITS_COOKIE}=metric; path=/`;
    renderWithUnits(
      <CalculatorCard def={CALCULATORS['drive-pipe-check']} props={{ fall: '4 ft', driveLength: '24 ft' }} />,
    );
    // 4 ft = 1.2192 m, 24 ft = 7.3152 m (NIST SP 811, 2008: 1 ft = 0.3048 m); the card re-expresses a
    // default as a tape gives it, to the cm under 5 m and the 0.1 m under 100 m (common practice, no source)
    expect(sketchName()).toContain('fall 1.22 m');
    expect(sketchName()).toContain('drive pipe 7.3 m');
    fireEvent.change(screen.getByLabelText(/^Fall$/), { target: { value: '2 m' } });
    expect(sketchName()).toContain('fall 2 m');
    fireEvent.change(screen.getByLabelText(/^Fall$/), { target: { value: '' } });
    expect(sketchName()).toMatch(/fall from the source’s surface/);
  });

  it('speaks US units to a US reader', () => {
    renderWithUnits(<CalculatorCard def={CALCULATORS['delivery-line']} props={{ lift: '29 ft', length: '150 ft' }} />);
    // the values as typed, in feet
    expect(sketchName()).toContain('lift 29 ft');
    expect(sketchName()).toContain('delivery line 150 ft');
  });

  it('is left out of cards that ask for no fall, lift or pipe length', () => {
    render(<CalculatorCard def={CALCULATORS['source-flow']} />);
    expect(screen.queryByRole('img', { name: /^Site sketch:/ })).toBeNull();
  });
});
