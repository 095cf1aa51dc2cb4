// @vitest-environment happy-dom
import { afterEach, describe, expect, it, vi } from 'vitest';
import { cleanup, fireEvent, render, screen, within } from '@testing-library/react';
import { LineChartCard, BarChartCard } from '@/components/calculators/charts';
import { CALCULATORS } from '@/lib/calculators';
import { CalculatorCard } from '@/components/calculators/kit/CalculatorCard';

vi.mock('next/navigation', () => ({ useRouter: () => ({ push: () => {} }) }));
const { EfficiencyChart } = await import('@/components/field-log/EfficiencyChart');

afterEach(cleanup);

const num = (el: Element, attr: string) => Number(el.getAttribute(attr));

describe('line chart', () => {
  const points = [0, 10, 20, 30, 40].map((x) => ({ x, y: 100 - 2 * x }));

  it('widens its axes to hold the reader’s point and labels it in the reader’s units', () => {
    const { container } = render(
      <LineChartCard
        title="Delivery against lift"
        x={{ name: 'lift', unit: 'ft' }}
        y={{ name: 'delivery', unit: 'US gal/h' }}
        points={points}
        mark={{ x: 75, y: 130 }}
      />,
    );
    const svg = container.querySelector('svg')!;
    const width = num(svg, 'width');
    const height = num(svg, 'height');
    const dot = container.querySelector('[data-chart-mark] circle:last-of-type')!;
    expect(num(dot, 'cx')).toBeGreaterThan(0);
    expect(num(dot, 'cx')).toBeLessThanOrEqual(width);
    expect(num(dot, 'cy')).toBeGreaterThan(0);
    expect(num(dot, 'cy')).toBeLessThanOrEqual(height);
    expect(screen.getByRole('img', { name: 'yours: 130 US gal/h at lift 75 ft' })).toBeTruthy();
    const ticks = [...container.querySelectorAll('[data-tick="x"]')].map((t) => t.textContent);
    // round ticks reaching past 75 ft (Heckbert 1990 loose labelling): 0, 20, …, 80
    expect(ticks[0]).toBe('0');
    expect(ticks.at(-1)).toBe('80');
    expect(container.textContent).not.toMatch(/\de[+-]?\d/);
  });

  it('draws whole axis titles and offers readouts of at least 24 px with names', () => {
    const { container } = render(
      <LineChartCard
        title="Delivery against lift"
        x={{ name: 'lift', unit: 'ft' }}
        y={{ name: 'delivery', unit: 'US gal/h' }}
        points={points}
      />,
    );
    const titles = [...container.querySelectorAll('[data-axis-title]')].map((t) => t.textContent).join(' ');
    expect(titles).toContain('delivery (US gal/h)');
    expect(titles).toContain('lift (ft)');
    const readouts = container.querySelectorAll('[data-readout]');
    expect(readouts.length).toBe(5);
    for (const r of readouts) {
      expect(r.getAttribute('tabindex')).toBe('0');
      // WCAG 2.2 SC 2.5.8 target size (minimum): 24 by 24 CSS px
      expect(num(r.querySelector('circle')!, 'r') * 2).toBeGreaterThanOrEqual(24);
    }
    expect(readouts[1]!.getAttribute('aria-label')).toBe('Delivery against lift: 80 US gal/h at 10 ft');
    fireEvent.focus(readouts[1]!);
    expect(container.querySelector('[data-chart-label="active"]')?.textContent).toBe('80 US gal/h at 10 ft');
  });

  it('carries a table of its numbers for screen readers', () => {
    render(
      <LineChartCard
        title="Friction loss against flow"
        x={{ name: 'flow', unit: 'L/min' }}
        y={{ name: 'loss', unit: 'm' }}
        points={points}
        mark={{ x: 12, y: 3 }}
      />,
    );
    const table = screen.getByRole('table', { name: 'Friction loss against flow' });
    expect(within(table).getAllByRole('row')).toHaveLength(1 + points.length + 1);
    expect(within(table).getByRole('rowheader', { name: '12 (yours)' })).toBeTruthy();
  });
});

describe('bar chart', () => {
  it('writes every name and value on its own line above its bar, the reader’s named "yours"', () => {
    const bars = [
      { name: 'PVC sch 40', value: 120 },
      { name: 'PVC sch 80', value: 131, highlight: true },
      { name: 'galvanized steel', value: 310 },
      { name: 'HDPE PE100 SDR11', value: 45 },
    ];
    const { container } = render(
      <BarChartCard title="Surge against pipe material" axis={{ name: 'surge', unit: 'psi' }} bars={bars} />,
    );
    expect(screen.getByRole('img', { name: 'PVC sch 80 (yours): 131 psi' })).toBeTruthy();
    // every text line in the rows sits at its own height: none overlaps another
    const ys = [...container.querySelectorAll('[data-bar] text')]
      .filter((t) => t.getAttribute('text-anchor') !== 'end')
      .map((t) => num(t, 'y'));
    const sorted = [...ys].sort((a, b) => a - b);
    for (let i = 1; i < sorted.length; i++) expect(sorted[i]! - sorted[i - 1]!).toBeGreaterThanOrEqual(14);
    for (const row of container.querySelectorAll('[data-bar]'))
      expect(num(row.querySelector('rect')!, 'height')).toBeGreaterThanOrEqual(24);
  });
});

describe('field log chart', () => {
  it('links every entry, names it with its numbers and labels the reader’s newest', () => {
    const points = [1, 2, 3].map((id) => ({ id, x: 2 + id, y: 0.3 + id / 10, site: `Site ${id}`, mine: id === 2 }));
    const { container } = render(<EfficiencyChart points={points} />);
    const links = container.querySelectorAll('a[data-entry-id]');
    expect(links).toHaveLength(3);
    expect(
      screen.getByRole('link', { name: 'Site 2 (yours): efficiency 0.50 at lift ratio 4.0' }).getAttribute('href'),
    ).toBe('/field-log/2');
    expect(container.querySelector('[data-chart-label="pinned-2"]')?.textContent).toBe(
      'yours, Site 2: 0.50 at h/H 4.0',
    );
    expect(within(screen.getByRole('list', { name: 'Key' })).getByText('your entries')).toBeTruthy();
    for (const a of links) expect(num(a.querySelector('circle')!, 'r') * 2).toBeGreaterThanOrEqual(24);
  });
});

describe('on the calculator card', () => {
  it('the yield estimate draws its SVG chart on first render, with no loading placeholder', () => {
    render(<CalculatorCard def={CALCULATORS['yield-estimate']} />);
    expect(screen.getByRole('group', { name: 'Delivery against lift' }).tagName.toLowerCase()).toBe('svg');
    expect(screen.getByRole('img', { name: /^yours: / })).toBeTruthy();
  });
});

describe('tick labels stay inside the chart', () => {
  it('the last tick of a bar chart, centred on the axis end, fits in the svg', () => {
    const bars = [
      { name: 'steel', value: 1540 },
      { name: 'PVC', value: 731, highlight: true },
    ];
    const { container } = render(<BarChartCard title="Surge" axis={{ name: 'surge', unit: 'kPa' }} bars={bars} />);
    const width = num(container.querySelector('svg')!, 'width');
    const last = [...container.querySelectorAll('[data-tick="x"]')].at(-1)!;
    // half the label's estimated width (0.62 em a character, as lib/charts/layout.ts estimates) right of its x
    expect(num(last, 'x') + (last.textContent!.length * 12 * 0.62) / 2).toBeLessThanOrEqual(width);
  });
});
