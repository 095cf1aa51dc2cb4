import { stallCheck } from '@/lib/calculators/defs/stallCheck';
import { stallCheckView } from '../views/stallCheck';
import { Card } from '../kit/Card';
import type { LiveProps } from './props';

/** The stall-check card alone: its definition and view, loaded by a guide after the page has hydrated. */
export default function Live({ props }: LiveProps) {
  return <Card def={stallCheck} view={stallCheckView} props={props} />;
}
