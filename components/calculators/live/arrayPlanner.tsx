import { arrayPlanner } from '@/lib/calculators/defs/arrayPlanner';
import { arrayPlannerView } from '../views/arrayPlanner';
import { Card } from '../kit/Card';
import type { LiveProps } from './props';

/** The array-planner card alone: its definition and view, loaded by a guide after the page has hydrated. */
export default function Live({ props }: LiveProps) {
  return <Card def={arrayPlanner} view={arrayPlannerView} props={props} />;
}
