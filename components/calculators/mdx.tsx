import { CALCULATORS } from '@/lib/calculators/registry';
import type { CalculatorId } from '@/lib/calculators/ids';
import { GuideCalculator } from './GuideCalculator';

type Props = Record<string, string | undefined>;

/**
 * Where a card will open, drawn on the server: its name and line, and the room it takes, so
 * the guide's text does not jump when the card arrives. No numbers here: a number drawn
 * before the reader's units are known could be in the wrong ones.
 */
function CardShell({ id }: { id: CalculatorId }) {
  const def = CALCULATORS[id];
  return (
    <section
      className="cw-card my-6 flex min-h-[26rem] min-w-0 max-w-full flex-col gap-3 overflow-hidden font-sans not-prose"
      data-calculator-shell={id}
      aria-label={def.name}
    >
      <header className="flex flex-wrap items-baseline justify-between gap-2">
        <p className="text-lg font-semibold">{def.name}</p>
        <p className="cw-muted text-xs">{def.blurb}</p>
      </header>
      <p className="cw-muted text-sm">Opening the calculator…</p>
      <noscript>
        <p className="text-sm">
          This calculator works in the browser and needs JavaScript; the guide reads without it.
        </p>
      </noscript>
    </section>
  );
}

function guideCard(id: CalculatorId) {
  const GuideCard = (props: Props) => <GuideCalculator id={id} props={props} shell={<CardShell id={id} />} />;
  GuideCard.displayName = `GuideCard(${id})`;
  return GuideCard;
}

/** The calculator components MDX guides may use, by their tag names (props: starting values with units). */
export const calculatorMdxComponents = {
  YieldEstimate: guideCard('yield-estimate'),
  ArrayPlanner: guideCard('array-planner'),
  DrivePipeCheck: guideCard('drive-pipe-check'),
  DeliveryLine: guideCard('delivery-line'),
  SourceFlow: guideCard('source-flow'),
  DemandAndStorage: guideCard('demand-and-storage'),
  StallCheck: guideCard('stall-check'),
};
