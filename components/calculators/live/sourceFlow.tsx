import { sourceFlow } from '@/lib/calculators/defs/sourceFlow';
import { Card } from '../kit/Card';
import { NO_VIEW, type LiveProps } from './props';

/** The source-flow card alone: its definition and view, loaded by a guide after the page has hydrated. */
export default function Live({ props }: LiveProps) {
  return <Card def={sourceFlow} view={NO_VIEW} props={props} />;
}
