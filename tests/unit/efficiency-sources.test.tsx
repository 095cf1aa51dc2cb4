// @vitest-environment happy-dom
import { afterEach, describe, expect, it, vi } from 'vitest';
import { cleanup, render, screen, within } from '@testing-library/react';
import { CALCULATORS } from '@/lib/calculators';
import { CalculatorCard } from '@/components/calculators/kit/CalculatorCard';

vi.mock('next/navigation', () => ({ useRouter: () => ({ push: () => {} }) }));
const { EfficiencyChart } = await import('@/components/field-log/EfficiencyChart');

afterEach(cleanup);

describe('efficiency sources on the product', () => {
  it.each(['yield-estimate', 'array-planner'] as const)(
    '%s names the published tables behind a Sources disclosure, not "from memory" on its face',
    (id) => {
      render(<CalculatorCard def={CALCULATORS[id]} />);
      const sources = screen.getByTestId('efficiency-sources');
      expect(within(sources).getByText('Sources').tagName).toBe('SUMMARY');
      expect(sources.textContent).toContain('Building Trades Pocketbook');
      expect(sources.textContent).toContain('Water for the World');
      expect(screen.getByTestId(`${id}-results`).textContent).not.toContain('from memory');
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
