/**
 * Invented forum posts for benchmarks: a seeded random generator (mulberry32) turns
 * a small vocabulary of the trade into questions, answers and replies with site
 * sheets, sizes in both unit systems and the trade's synonyms. Same seed, same posts.
 */
export function mulberry32(seed: number) {
  return () => {
    seed |= 0;
    seed = (seed + 0x6d2b79f5) | 0;
    let t = Math.imul(seed ^ (seed >>> 15), 1 | seed);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

const PLACES = [
  'Alder',
  'Birchcombe',
  'Coldwell',
  'Dunmere',
  'Eskholm',
  'Fallowgill',
  'Greyrigg',
  'Hollin',
  'Inchbeck',
  'Juniper',
  'Kestle',
  'Larkhill',
  'Millbrook',
  'Nethercot',
  'Oakfold',
  'Pennyghyll',
  'Quarrel',
  'Rushmere',
  'Stonegarth',
  'Thornbeck',
  'Underhill',
  'Vale',
  'Whinfield',
  'Yarrow',
];
const WATERS = ['brook', 'creek', 'beck', 'burn', 'spring', 'stream', 'ghyll', 'race'];
const SIZES = [
  '1/2 inch',
  '¾"',
  '3/4 inch',
  '1-inch',
  '1"',
  '25 mm',
  '19 mm',
  'DN32',
  '1 1/4"',
  '1½ inch',
  '2"',
  'DN50',
  '0.75 in',
  '32 mm',
];
const PARTS = [
  'waste valve',
  'impulse valve',
  'air chamber',
  'pressure tank',
  'drive pipe',
  'drive line',
  'delivery valve',
  'snifter',
  'delivery line',
  'intake screen',
  'float valve',
  'overflow',
];
const SYMPTOMS = [
  'stops after a few beats',
  'beats fast but delivers little',
  'hammers and bangs',
  'never starts',
  'stalls when the water drops',
  'gulps air at the intake',
  'delivery stops in frost',
  'water-logs within a week',
  'slows down over a day',
  'leaks at the union',
];
const MATERIALS = ['PVC', 'galvanised steel', 'HDPE', 'schedule 40 PVC', 'steel'];
const VERBS = [
  'replaced',
  'shortened',
  'lengthened',
  'weighted',
  'drained',
  'lowered',
  'raised',
  'cleaned',
  're-seated',
  'straightened',
];
const ADVICE = [
  'Keep the drive pipe rigid and straight, and several times the fall in length.',
  'Set the stroke first, then add weight a washer at a time, timing the beats.',
  'Check the snifter hole is clear so the air chamber keeps its cushion.',
  'Sink the intake well below the lowest water so no vortex draws air.',
  'Drain the pump body and the low run of the line before the first frost.',
  'Size the delivery line so friction stays a small share of the lift.',
  'Two pumps in parallel need a drive pipe each and a pool that spares both flows.',
  'Test the water before anyone drinks it, and follow the local health authority.',
];

export interface BenchPost {
  kind: 'question' | 'answer' | 'reply';
  id: number;
  questionId: number;
  title: string;
  body: string;
  tags: string[];
  siteSheet: Record<string, string> | null;
  solved: boolean;
  hidden: boolean;
  daysAgo: number;
}

const TAGS = [
  'survey',
  'drive-pipe',
  'tuning',
  'parallel',
  'staged',
  'delivery-line',
  'storage',
  'stall',
  'frost',
  'drinking-water',
  'water-rights',
  'livestock',
];

/** `count` posts: one question in four, answers and replies after it; about 2% hidden. */
export function* generatePosts(count: number, seed = 20261202): Generator<BenchPost> {
  const r = mulberry32(seed);
  const pick = <T>(xs: readonly T[]) => xs[Math.floor(r() * xs.length)];
  let q = 0;
  let a = 0;
  let p = 0;
  let current: BenchPost | null = null;
  for (let n = 0; n < count; n++) {
    if (!current || r() < 0.25) {
      const fallFt = 2 + Math.floor(r() * 14);
      const liftFt = fallFt * (3 + Math.floor(r() * 12));
      const size = pick(SIZES);
      const part = pick(PARTS);
      const place = `${pick(PLACES)} ${pick(WATERS)}`;
      current = {
        kind: 'question',
        id: ++q,
        questionId: q,
        title: `${size} pump at ${place}: ${part} ${pick(SYMPTOMS)}`,
        body: `On ${place} we have ${r() < 0.5 ? `${fallFt} ft` : `${(fallFt * 0.3048).toFixed(1)} m`} of fall and about ${liftFt} ft of lift. The ${part} ${pick(SYMPTOMS)}. Drive pipe is ${fallFt * 6} ft of ${pick(SIZES)} ${pick(MATERIALS)}. I ${pick(VERBS)} the ${pick(PARTS)} and it ${pick(SYMPTOMS)}. What should I check next?`,
        tags: [pick(TAGS), pick(TAGS)].filter((t, i, all) => all.indexOf(t) === i),
        siteSheet: {
          fall: `${fallFt} ft`,
          lift: `${liftFt} ft`,
          driveSize: size,
          pumps: String(1 + Math.floor(r() * 3)),
        },
        solved: r() < 0.4,
        hidden: r() < 0.02,
        daysAgo: Math.floor(r() * 1500),
      };
      yield current;
    } else if (r() < 0.65) {
      yield {
        ...current,
        kind: 'answer',
        id: ++a,
        body: `${pick(ADVICE)} On a ${pick(SIZES)} pump the ${pick(PARTS)} usually ${pick(SYMPTOMS)} when the ${pick(PARTS)} is wrong. ${pick(ADVICE)}`,
        siteSheet: null,
        hidden: r() < 0.02,
      };
    } else {
      yield {
        ...current,
        kind: 'reply',
        id: ++p,
        body: `I ${pick(VERBS)} the ${pick(PARTS)} on ours at ${pick(PLACES)} and it stopped: ${pick(ADVICE)}`,
        siteSheet: null,
        hidden: r() < 0.02,
      };
    }
  }
}

/** A mixed set of queries: symptoms, sizes written many ways, synonyms, filters. */
export function benchQueries(count: number, seed = 7): { q: string; kind?: string; tag?: string; solved?: boolean }[] {
  const r = mulberry32(seed);
  const pick = <T>(xs: readonly T[]) => xs[Math.floor(r() * xs.length)];
  const out: { q: string; kind?: string; tag?: string; solved?: boolean }[] = [];
  for (let i = 0; i < count; i++) {
    const shape = r();
    const q =
      shape < 0.25
        ? `Has anyone had a ${pick(SIZES)} pump ${pick(SYMPTOMS)}?`
        : shape < 0.5
          ? `${pick(PARTS)} ${pick(SYMPTOMS)}`
          : shape < 0.7
            ? `${pick(SIZES)} ${pick(PARTS)}`
            : shape < 0.85
              ? `${pick(PLACES)} ${pick(WATERS)}`
              : pick(ADVICE).split(' ').slice(0, 5).join(' ');
    const filter = r();
    out.push(
      filter < 0.7
        ? { q }
        : filter < 0.8
          ? { q, kind: 'question' }
          : filter < 0.9
            ? { q, tag: pick(TAGS) }
            : { q, solved: true },
    );
  }
  return out;
}
