import type { CalculatorView } from '../views/types';

export interface LiveProps {
  /** starting values written with their units, as the guide's MDX gives them */
  props: Record<string, string | undefined>;
}

/** A calculator with no chart or panel of its own shows its result rows only. */
export const NO_VIEW: CalculatorView<unknown> = {};
