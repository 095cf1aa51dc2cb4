import Link from 'next/link';
import { listQuestions, type QuestionPage } from '@/lib/questions/list';
import { isDatabaseUnavailable } from '@/lib/db/errors';
import { QuestionList } from '@/components/QuestionList';
import { ServiceUnavailable } from '@/components/ServiceUnavailable';
import { Caution } from '@/components/Caution';
import { readUnitPreference } from '@/lib/units/server';

export const dynamic = 'force-dynamic';

const PATHS = [
  { href: '/guides', title: 'Read a guide', text: 'From “is there enough fall here?” to a tuned, beating pump.' },
  {
    href: '/calculators',
    title: 'Run the numbers',
    text: 'Yield, drive pipe, delivery line, source flow, demand and the stall check.',
  },
  {
    href: '/questions',
    title: 'Ask the builders',
    text: 'Bring your site’s measurements; get answers with the working shown.',
  },
  {
    href: '/field-log',
    title: 'Read the field log',
    text: 'Measured installations: what real pumps delivered on real falls.',
  },
  {
    href: '/field-kit',
    title: 'Measure at the water',
    text: 'The field kit: a one-handed trial timer, a beat counter and a hose-level fall survey.',
  },
];

export default async function HomePage() {
  const units = await readUnitPreference();
  let latest: QuestionPage | null = null;
  let dbDown = false;
  try {
    latest = await listQuestions({ page: 1, perPage: 5 });
  } catch (err) {
    if (!isDatabaseUnavailable(err)) throw err;
    dbDown = true;
  }
  return (
    <div className="flex flex-col gap-8">
      <section>
        <h1 className="font-serif text-3xl font-semibold leading-tight sm:text-4xl">Lift water with falling water.</h1>
        <p className="cw-prose mt-3">
          A hydraulic ram uses a few feet of fall in a rigid drive pipe to push part of a stream much higher — no fuel,
          no electricity, just the clack of the waste valve. Clackwater is where homesteaders, graziers, cabin owners
          and the builders who help them work out whether a ram will do, build it, tune it and keep it beating.
        </p>
      </section>
      <Link
        href="/plan"
        className="cw-card flex flex-col gap-1 border-2 border-clay-600 no-underline hover:border-clay-700 dark:border-clay-300"
        data-testid="plan-a-site"
      >
        <h2 className="font-serif text-2xl font-semibold text-clay-700 dark:text-clay-200">Plan a site</h2>
        <p className="text-sm">
          Your fall, flow, lift and what the water is for: whether a ram works there, what to build and the parts to
          buy, on one page you can print for the creek.
        </p>
      </Link>
      <section className="grid gap-3 sm:grid-cols-2">
        {PATHS.map((p) => (
          <Link key={p.href} href={p.href} className="cw-card block no-underline hover:border-clay">
            <h2 className="font-semibold text-clay-600 dark:text-clay-300">{p.title}</h2>
            <p className="cw-muted mt-1 text-sm">{p.text}</p>
          </Link>
        ))}
      </section>
      <Caution title="Before you work at the water">
        Streams rise fast and banks are slippery: never work alone in high water. Ram-pumped surface water is untreated
        — test and treat it before anyone drinks it. See the{' '}
        <Link href="/safety" className="cw-link">
          safety notice
        </Link>
        .
      </Caution>
      <section>
        <h2 className="mb-3 font-serif text-2xl font-semibold">Latest questions</h2>
        {dbDown || !latest ? (
          <ServiceUnavailable what="the latest questions" />
        ) : (
          <QuestionList items={latest.items} units={units} />
        )}
      </section>
    </div>
  );
}
