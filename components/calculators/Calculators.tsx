'use client';

/**
 * The live calculators as components, for MDX guides (`<YieldEstimate fall="4 ft" />`)
 * and the calculator pages. Props are starting values written with their units.
 */
import { CalculatorCard } from './kit/CalculatorCard';
import { arrayPlannerDef } from './defs/arrayPlanner';
import { deliveryLineDef } from './defs/deliveryLine';
import { demandAndStorageDef } from './defs/demandAndStorage';
import { drivePipeCheckDef } from './defs/drivePipeCheck';
import { sourceFlowDef } from './defs/sourceFlow';
import { stallCheckDef } from './defs/stallCheck';
import { yieldEstimateDef } from './defs/yieldEstimate';
import { calculatorDefs } from './defs';

type Props = Record<string, string | undefined>;

export const YieldEstimate = (props: Props) => <CalculatorCard def={yieldEstimateDef} props={props} />;
export const ArrayPlanner = (props: Props) => <CalculatorCard def={arrayPlannerDef} props={props} />;
export const DrivePipeCheck = (props: Props) => <CalculatorCard def={drivePipeCheckDef} props={props} />;
export const DeliveryLine = (props: Props) => <CalculatorCard def={deliveryLineDef} props={props} />;
export const SourceFlow = (props: Props) => <CalculatorCard def={sourceFlowDef} props={props} />;
export const DemandAndStorage = (props: Props) => <CalculatorCard def={demandAndStorageDef} props={props} />;
export const StallCheck = (props: Props) => <CalculatorCard def={stallCheckDef} props={props} />;

/** A calculator chosen by id, e.g. on /calculators/[tool] with the share link's inputs. */
export function CalculatorById({ id, props }: { id: string; props: Props }) {
  const def = calculatorDefs[id];
  return def ? <CalculatorCard def={def} props={props} /> : null;
}
