// @vitest-environment happy-dom
import { afterEach, describe, expect, it, vi } from 'vitest';
import { cleanup, fireEvent, render, screen, within } from '@testing-library/react';
import { CALCULATORS } from '@/lib/calculators';
import { CalculatorCard } from '@/components/calculators/kit/CalculatorCard';

vi.mock('next/navigation', () => ({ useRouter: () => ({ push: () => {} }) }));

afterEach(cleanup);

describe('the card’s verdict', () => {
  it('heads the results with the verdict in words', () => {
    // 29 ft ÷ 4 ft = 7.25, well under 26 (Building Trades Pocketbook table ends at 26)
    render(<CalculatorCard def={CALCULATORS['yield-estimate']} props={{ fall: '4 ft', lift: '29 ft' }} />);
    const v = screen.getByTestId('verdict');
    expect(v.getAttribute('data-verdict')).toBe('works');
    expect(within(v).getByTestId('verdict-words').textContent).toContain('Works');
    expect(screen.queryByTestId('beyond-range')).toBeNull();
  });

  it('sets a result past the engine’s range apart, in words, and says it cannot vouch for it', () => {
    // 600 ft ÷ 4 ft = 150 > 26 (Building Trades Pocketbook table ends at 26)
    render(<CalculatorCard def={CALCULATORS['yield-estimate']} props={{ fall: '4 ft', lift: '600 ft' }} />);
    const v = screen.getByTestId('verdict');
    expect(v.getAttribute('data-beyond-range')).toBe('true');
    expect(v.className).toContain('border-dashed');
    expect(within(v).getByTestId('beyond-range').textContent).toContain('Outside what the engine can vouch for');
    expect(v.textContent).toContain('cannot vouch');
  });

  it('does not show the engine version or "from memory" on the card’s face', () => {
    render(<CalculatorCard def={CALCULATORS['drive-pipe-check']} />);
    const results = screen.getByTestId('drive-pipe-check-results');
    expect(results.textContent).not.toMatch(/Engine \d/);
    const sources = screen.getByTestId('calculator-sources');
    expect(within(sources).getByText('Sources').tagName).toBe('SUMMARY');
    // every "from memory" the card holds is inside the closed Sources disclosure
    const outside = results.cloneNode(true) as HTMLElement;
    outside.querySelector('[data-testid="calculator-sources"]')?.remove();
    outside.querySelector('[data-testid="working"]')?.remove();
    expect(outside.textContent).not.toContain('from memory');
    expect(sources.textContent).toContain('Calvert');
  });

  it('demand and storage opens asking for the demand, not "Demand 0" beside a warning', () => {
    render(<CalculatorCard def={CALCULATORS['demand-and-storage']} />);
    const results = screen.getByTestId('demand-and-storage-results');
    expect(screen.getByTestId('verdict').getAttribute('data-verdict')).toBe('ask');
    expect(results.querySelector('[data-warning]')).toBeNull();
    expect(results.querySelector('[data-result="Demand per day"]')).toBeNull();
  });
});

describe('the same calculator twice on one page', () => {
  it('keeps every id to its own card, so a label names its own field', () => {
    const { container } = render(
      <>
        <CalculatorCard def={CALCULATORS['delivery-line']} />
        <CalculatorCard def={CALCULATORS['delivery-line']} />
      </>,
    );
    const ids = [...container.querySelectorAll('[id]')].map((e) => e.id);
    expect(ids.length).toBeGreaterThan(10);
    expect(new Set(ids).size).toBe(ids.length);
    const [first, second] = screen.getAllByLabelText('Lift') as HTMLInputElement[];
    expect(first).toBeDefined();
    expect(second).toBeDefined();
    expect(first).not.toBe(second);
    const labels = screen.getAllByText('Lift', { selector: 'label' });
    expect(document.getElementById(labels[1]!.getAttribute('for')!)).toBe(second);
    fireEvent.change(second!, { target: { value: '40' } });
    expect(first!.value).not.toBe('40');
  });

  it('gives the stall check’s tick boxes a 24 px target (WCAG 2.2, 2.5.8)', () => {
    render(<CalculatorCard def={CALCULATORS['stall-check']} />);
    const boxes = screen.getAllByRole('checkbox');
    expect(boxes.length).toBeGreaterThan(0);
    for (const b of boxes) expect(b.className).toMatch(/\bh-6\b.*\bw-6\b|\bw-6\b.*\bh-6\b/);
  });
});
