import type { ReactNode } from 'react';
import type { UnitSystem } from '@/lib/hydraulics';

/**
 * What a calculator shows beyond its result rows: a chart where a curve says
 * more, and a panel of its own (e.g. the stall check's ranked causes). Methods,
 * so one calculator's view stands in for a view of unknown results without a cast.
 */
export interface CalculatorView<R> {
  /** `input` is the form's fields as read (SI), before the definition's toInput */
  chart?(results: R, units: UnitSystem, input: Record<string, unknown>): ReactNode;
  extra?(results: R, units: UnitSystem): ReactNode;
  /** where the chart's curves come from, shown under it */
  sources?(results: R, input: Record<string, unknown>): ReactNode;
}
