import type { Metadata } from 'next';
import 'katex/dist/katex.min.css';
import { SitePlanner } from '@/components/plan/SitePlanner';
import { Caution } from '@/components/Caution';

export const metadata: Metadata = {
  title: 'Plan a site',
  description: 'Your survey in: whether a ram pump works at your site, what to build, and the parts to buy.',
};

type SP = Promise<Record<string, string | string[] | undefined>>;

export default async function PlanPage({ searchParams }: { searchParams: SP }) {
  // the plan's inputs as the share link carries them (each with its unit)
  const props = Object.fromEntries(
    Object.entries(await searchParams).filter((e): e is [string, string] => typeof e[1] === 'string'),
  );
  return (
    <div className="flex flex-col gap-4">
      <h1 className="font-serif text-3xl font-semibold">Plan a site</h1>
      <p className="cw-prose cw-muted" data-print-hide>
        Put in what you measured. The plan below says whether a ram will work here and why, what to build and what to
        buy, and changes as you type.
      </p>
      <SitePlanner props={props} />
      <Caution title="A plan, not a permit">
        A ram’s pump side and delivery line hold pressure, and moving water can hurt people. The plan uses standard
        formulas and typical values; real streams, pipes and pumps vary. Taking water from a stream may need a permit,
        and water for drinking must be tested and treated as your local rules say. Follow local codes and ask a licensed
        plumber or engineer where it matters.
      </Caution>
    </div>
  );
}
