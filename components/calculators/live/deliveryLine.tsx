import { deliveryLine } from '@/lib/calculators/defs/deliveryLine';
import { deliveryLineView } from '../views/deliveryLine';
import { Card } from '../kit/Card';
import type { LiveProps } from './props';

/** The delivery-line card alone: its definition and view, loaded by a guide after the page has hydrated. */
export default function Live({ props }: LiveProps) {
  return <Card def={deliveryLine} view={deliveryLineView} props={props} />;
}
