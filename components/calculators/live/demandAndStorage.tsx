import { demandAndStorage } from '@/lib/calculators/defs/demandAndStorage';
import { Card } from '../kit/Card';
import { NO_VIEW, type LiveProps } from './props';

/** The demand-and-storage card alone: its definition and view, loaded by a guide after the page has hydrated. */
export default function Live({ props }: LiveProps) {
  return <Card def={demandAndStorage} view={NO_VIEW} props={props} />;
}
