'use client';

/**
 * The live calculators as components, for the calculator pages and threads. Props are
 * starting values written with their units. Guides use ./mdx.tsx, which loads each card on its own.
 */
import { getCalculator } from '@/lib/calculators';
import { CalculatorCard } from './kit/CalculatorCard';

type Props = Record<string, string | undefined>;

/** A calculator chosen by id, e.g. on /calculators/[tool] with the share link's inputs, kept as typed. */
export function CalculatorById({ id, props }: { id: string; props: Props }) {
  const def = getCalculator(id);
  return def ? <CalculatorCard def={def} props={props} openIn="defaults" /> : null;
}
