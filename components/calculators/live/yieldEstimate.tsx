import { yieldEstimate } from '@/lib/calculators/defs/yieldEstimate';
import { yieldEstimateView } from '../views/yieldEstimate';
import { Card } from '../kit/Card';
import type { LiveProps } from './props';

/** The yield-estimate card alone: its definition and view, loaded by a guide after the page has hydrated. */
export default function Live({ props }: LiveProps) {
  return <Card def={yieldEstimate} view={yieldEstimateView} props={props} />;
}
