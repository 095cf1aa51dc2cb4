// @vitest-environment happy-dom
import { afterEach, describe, expect, it, vi } from 'vitest';
import { cleanup, render, screen, within } from '@testing-library/react';
import { CALCULATORS, computeFromForm } from '@/lib/calculators';
import { CalculatorCard } from '@/components/calculators/kit/CalculatorCard';

vi.mock('next/navigation', () => ({ useRouter: () => ({ push: () => {} }) }));
const { EfficiencyChart } = await import('@/components/field-log/EfficiencyChart');

afterEach(cleanup);

describe('efficiency sources on the product', () => {
  it.each(['yield-estimate', 'array-planner'] as const)(
    '%s names the published tables behind a Sources disclosure, not "from memory" on its face',
    (id) => {
      render(<CalculatorCard def={CALCULATORS[id]} />);
      const sources = screen.getByTestId('calculator-sources');
      expect(within(sources).getByText('Sources').tagName).toBe('SUMMARY');
      expect(sources.textContent).toContain('Building Trades Pocketbook');
      expect(sources.textContent).toContain('Water for the World');
      // the face of the card: everything but the closed Sources disclosure
      const face = screen.getByTestId(`${id}-results`).cloneNode(true) as HTMLElement;
      face.querySelector('[data-testid="calculator-sources"]')?.remove();
      expect(face.textContent).not.toContain('from memory');
    },
  );

  it('the field log chart counts the measurements and names the published series', () => {
    const points = [1, 2, 3].map((id) => ({ id, x: 4 + id, y: 0.3, site: `Site ${id}`, mine: id === 2 }));
    render(<EfficiencyChart points={points} />);
    expect(screen.getByTestId('field-log-count').textContent).toContain('3 field log measurements');
    const caption = screen.getByTestId('field-log-chart').textContent ?? '';
    expect(caption).toContain('Building Trades Pocketbook');
    expect(caption).toContain('Water for the World');
    expect(caption).not.toContain('from memory, see');
  });
});

describe('gallon pickers', () => {
  it('offer imperial gallons beside US gallons, and read them', () => {
    render(<CalculatorCard def={CALCULATORS['demand-and-storage']} />);
    const picker = screen.getByLabelText('Ram delivery per day unit');
    const labels = [...picker.querySelectorAll('option')].map((o) => o.textContent);
    expect(labels).toEqual(expect.arrayContaining(['US gal/day', 'imp gal/day']));
    const r = computeFromForm('demand-and-storage', { delivery: '100 galimp/day' });
    // 1 imperial gallon = 4.54609 L exactly (UK Weights and Measures Act 1985, Schedule 1)
    expect(r.ok && (r.output.results as { deliveryM3PerDay: number }).deliveryM3PerDay).toBeCloseTo(0.454609, 9);
  });
});

describe('drive pipe check card', () => {
  it('names the fatigue curve and the threaded-joint derating beside the results', () => {
    render(
      <CalculatorCard def={CALCULATORS['drive-pipe-check']} props={{ material: 'pvc-sch80', joints: 'threaded' }} />,
    );
    const results = screen.getByTestId('drive-pipe-check-results');
    expect(results.textContent).toContain('Weakest rating (threaded joints)');
    expect(results.textContent).toContain('Joints: threaded schedule 80 PVC at half its rating');
    expect(results.textContent).toMatch(/Fatigue life: .*Vinson/);
  });
});
