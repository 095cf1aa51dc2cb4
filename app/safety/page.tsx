import type { Metadata } from 'next';
import { Caution } from '@/components/Caution';

export const metadata: Metadata = {
  title: 'Safety notice',
  description: 'The hazards of ram pump work and who to ask before you build.',
};

const HAZARDS = [
  {
    title: 'Water hammer',
    text: 'A ram works by stopping a moving column of water suddenly. The pressure spike it makes can burst pipes, fittings and gauges that are not rated for it. Use pressure-rated parts, check ratings against the surge, and stand clear of a pump under test.',
  },
  {
    title: 'Air chambers hold stored energy',
    text: 'The air chamber is a pressure vessel. Never build one from glass, thin-walled or unrated parts. Release the pressure before opening anything.',
  },
  {
    title: 'Streams rise fast; banks are slippery',
    text: 'Never work alone at the water, and never in high or rising water. Tell someone where you are. Flood debris can bury or carry off a pump — anchor it and keep clear in a spate.',
  },
  {
    title: 'The water is untreated',
    text: 'Ram-pumped surface water carries whatever is upstream. Have it tested by an accredited laboratory and treat it before anyone drinks it; ask your local health authority what that takes.',
  },
  {
    title: 'Frost',
    text: 'Freezing water splits pump bodies, valves and pipe. Drain what you cannot keep running, bury or insulate lines, and check after every hard frost.',
  },
  {
    title: 'Water rights and permits',
    text: 'Taking water from a stream or spring usually needs a right or a permit, even on your own land, and rules often limit how much of the flow you may divert. Ask the authority that issues them before you build.',
  },
];

export default function SafetyPage() {
  return (
    <article className="flex flex-col gap-4">
      <h1 className="font-serif text-3xl font-semibold">Safety notice</h1>
      <p className="cw-prose">
        Clackwater shares what builders have learned. It is not a substitute for local codes, the authority that issues
        water permits, or a licensed plumber or engineer. Where their rules or advice differ from anything here, follow
        them.
      </p>
      {HAZARDS.map((h) => (
        <Caution key={h.title} title={h.title}>
          {h.text}
        </Caution>
      ))}
    </article>
  );
}
