import { drivePipeCheck } from '@/lib/calculators/defs/drivePipeCheck';
import { drivePipeCheckView } from '../views/drivePipeCheck';
import { Card } from '../kit/Card';
import type { LiveProps } from './props';

/** The drive-pipe-check card alone: its definition and view, loaded by a guide after the page has hydrated. */
export default function Live({ props }: LiveProps) {
  return <Card def={drivePipeCheck} view={drivePipeCheckView} props={props} />;
}
