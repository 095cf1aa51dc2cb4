'use client';

/**
 * The live calculators as components, for MDX guides (`<YieldEstimate fall="4 ft" />`)
 * and the calculator pages. Props are starting values written with their units.
 */
import { CALCULATORS, getCalculator } from '@/lib/calculators';
import { CalculatorCard } from './kit/CalculatorCard';

type Props = Record<string, string | undefined>;

export const YieldEstimate = (props: Props) => <CalculatorCard def={CALCULATORS['yield-estimate']} props={props} />;
export const ArrayPlanner = (props: Props) => <CalculatorCard def={CALCULATORS['array-planner']} props={props} />;
export const DrivePipeCheck = (props: Props) => <CalculatorCard def={CALCULATORS['drive-pipe-check']} props={props} />;
export const DeliveryLine = (props: Props) => <CalculatorCard def={CALCULATORS['delivery-line']} props={props} />;
export const SourceFlow = (props: Props) => <CalculatorCard def={CALCULATORS['source-flow']} props={props} />;
export const DemandAndStorage = (props: Props) => (
  <CalculatorCard def={CALCULATORS['demand-and-storage']} props={props} />
);
export const StallCheck = (props: Props) => <CalculatorCard def={CALCULATORS['stall-check']} props={props} />;

/** A calculator chosen by id, e.g. on /calculators/[tool] with the share link's inputs, kept as typed. */
export function CalculatorById({ id, props }: { id: string; props: Props }) {
  const def = getCalculator(id);
  return def ? <CalculatorCard def={def} props={props} openIn="defaults" /> : null;
}
