/**
 * The demo scenario, invented from end to end: Ferncombe, a smallholding on the
 * spring-fed Linnet Brook in hill country; Highcrag, the neighbouring sheep farm
 * watering its far paddock; and a cabin on seasonal Sorrel Creek. No real people,
 * places or products. Numbers are plausible, not measured.
 */
import type { CalculatorId } from '@/lib/calculators';

/** Every demo account signs in with this password (README lists the accounts). Demo only. */
export const DEMO_PASSWORD = 'lift-with-falling-water';

export const demoUsers = [
  {
    handle: 'ferncombe_tamsin',
    displayName: 'Tamsin at Ferncombe',
    email: 'tamsin@ferncombe.example',
    role: 'member',
    region: 'Linnet valley, hill country',
  },
  {
    handle: 'highcrag_shepherd',
    displayName: 'Highcrag Shepherd',
    email: 'shepherd@highcrag.example',
    role: 'member',
    region: 'Highcrag, upper Linnet valley',
  },
  {
    handle: 'sorrel_cabin',
    displayName: 'Sorrel Creek Cabin',
    email: 'cabin@sorrelcreek.example',
    role: 'member',
    region: 'Sorrel Creek headwaters',
  },
  {
    handle: 'ironwheel_builds',
    displayName: 'Ironwheel Builds',
    email: 'builds@ironwheel.example',
    role: 'expert',
    region: 'Lower Linnet valley',
  },
  {
    handle: 'quarry_lane_valves',
    displayName: 'Quarry Lane Valves',
    email: 'valves@quarrylane.example',
    role: 'expert',
    region: 'Fellside',
  },
  {
    handle: 'moss_moderator',
    displayName: 'Moss (moderator)',
    email: 'moss@clackwater.example',
    role: 'moderator',
    region: null,
  },
  {
    handle: 'clack_admin',
    displayName: 'Clackwater admin',
    email: 'admin@clackwater.example',
    role: 'admin',
    region: null,
  },
] as const;

/** Each demo member's digest and the tags it follows (the rest keep the defaults: digest off, every notification on). */
export const demoMailChoices: Record<string, { digest: 'off' | 'daily' | 'weekly'; follows: string[] }> = {
  ferncombe_tamsin: { digest: 'weekly', follows: ['parallel', 'livestock', 'frost'] },
  highcrag_shepherd: { digest: 'weekly', follows: ['stall', 'drive-pipe', 'tuning'] },
  sorrel_cabin: { digest: 'daily', follows: ['drinking-water', 'frost', 'storage'] },
  ironwheel_builds: { digest: 'weekly', follows: ['drive-pipe', 'tuning', 'stall', 'parallel'] },
  quarry_lane_valves: { digest: 'weekly', follows: ['tuning', 'staged', 'delivery-line', 'water-rights'] },
};

export const demoTags = [
  { slug: 'survey', name: 'Survey', description: 'Measuring fall, source flow, lift and pipe runs before you build.' },
  {
    slug: 'drive-pipe',
    name: 'Drive pipe',
    description: 'Length, size, material and fittings of the pipe that feeds the pump.',
  },
  { slug: 'tuning', name: 'Tuning', description: 'Waste valve stroke and weight, beats per minute, first start.' },
  {
    slug: 'parallel',
    name: 'Pumps in parallel',
    description: 'Several pumps, each with its own drive pipe, into one delivery line.',
  },
  { slug: 'staged', name: 'Pumps in stages', description: 'A lower pump filling a tank that drives an upper pump.' },
  {
    slug: 'delivery-line',
    name: 'Delivery line',
    description: 'The pipe from the pump up to the tank: size, friction, filling it.',
  },
  { slug: 'storage', name: 'Storage', description: 'Tanks, overflows and float valves.' },
  { slug: 'stall', name: 'Stops cycling', description: 'When the waste valve stops beating, or delivery drops.' },
  { slug: 'frost', name: 'Frost', description: 'Protecting pumps and pipe from freezing.' },
  {
    slug: 'drinking-water',
    name: 'Drinking water',
    description: 'Testing and treating ram-pumped water before anyone drinks it.',
  },
  {
    slug: 'water-rights',
    name: 'Water rights',
    description: 'Diversions, permits and how much of a stream you may take.',
  },
  { slug: 'livestock', name: 'Livestock', description: 'Watering animals away from the stream.' },
] as const;

type DemoQuestion = {
  author: string;
  title: string;
  body: string;
  tags: string[];
  daysAgo: number;
  answers: { author: string; body: string; hoursLater: number }[];
};

export const demoQuestions: DemoQuestion[] = [
  {
    author: 'ferncombe_tamsin',
    title: 'Half-inch pump beats for a minute, then stops — drive pipe too short?',
    body: 'Our brook gives about 4 ft of fall to the pump. Drive pipe is 12 ft of ¾" PVC. The waste valve beats about 60 a minute for a while, then stops shut and I have to tap it. Lift to the tank is about 29 ft. What should I check first?',
    tags: ['stall', 'drive-pipe', 'tuning'],
    daysAgo: 2,
    answers: [
      {
        author: 'ironwheel_builds',
        hoursLater: 3,
        body: 'Twelve feet is on the short side for 4 ft of fall. Most builders aim for a drive pipe several times the fall and keep it rigid and straight. Before re-piping, check the intake screen is fully under water: a pump that stops after a minute often has the source dropping and the drive pipe drawing air.',
      },
    ],
  },
  {
    author: 'highcrag_shepherd',
    title: 'Two small pumps side by side or one bigger one for the far paddock?',
    body: 'The far paddock trough sits about 30 ft above the beck. Sixty ewes in summer. I have room for two drive pipes off the same pool. Is two ½" pumps into one delivery line better than one 1¼"?',
    tags: ['parallel', 'livestock'],
    daysAgo: 5,
    answers: [
      {
        author: 'quarry_lane_valves',
        hoursLater: 6,
        body: 'Two in parallel roughly doubles what one gives, as long as each has its own drive pipe and the pool can spare both drive flows. Keep the drive pipes identical — an extra elbow on one costs that pump some delivery.',
      },
      {
        author: 'ferncombe_tamsin',
        hoursLater: 30,
        body: 'We run two side by side at Ferncombe. Make sure the delivery line is big enough for the combined flow.',
      },
    ],
  },
  {
    author: 'sorrel_cabin',
    title: 'Creek only runs March to October — how do I drain the pump for winter?',
    body: 'The cabin creek dries to a trickle by late autumn and freezes in January. The pump is cast fittings with a PVC air chamber. What is the safe way to lay it up?',
    tags: ['frost', 'storage'],
    daysAgo: 9,
    answers: [
      {
        author: 'ironwheel_builds',
        hoursLater: 20,
        body: 'Drain the drive pipe, the pump body and the lowest run of the delivery line, and bring the valves indoors if you can. Water left in fittings splits them when it freezes.',
      },
    ],
  },
  {
    author: 'ferncombe_tamsin',
    title: 'Is brook water from the ram safe for the house?',
    body: 'We want to send some of the delivered water to the kitchen tap. The brook runs past sheep pasture upstream.',
    tags: ['drinking-water'],
    daysAgo: 12,
    answers: [
      {
        author: 'quarry_lane_valves',
        hoursLater: 4,
        body: 'Treat it as untreated surface water. Have it tested by an accredited lab and talk to your local health authority about treatment before anyone drinks it. With pasture upstream, expect to need filtration and disinfection.',
      },
    ],
  },
  {
    author: 'highcrag_shepherd',
    title: 'How do I measure the fall without a surveyor’s level?',
    body: 'The pool to the pump site is about 40 yards of rough bank. I have a garden hose and a tape.',
    tags: ['survey'],
    daysAgo: 15,
    answers: [
      {
        author: 'ironwheel_builds',
        hoursLater: 2,
        body: 'A clear hose filled with water works as a water level: hold one end at the pool surface, the other at the pump site, and measure the difference. Do it in stages on a long bank, and never alone when the stream is high.',
      },
    ],
  },
  {
    author: 'sorrel_cabin',
    title: 'Delivery line: ½" or ¾" for 400 ft to the tank?',
    body: 'The tank is 400 ft of pipe away and 45 ft up. The pump delivers maybe a litre a minute.',
    tags: ['delivery-line'],
    daysAgo: 18,
    answers: [],
  },
  {
    author: 'ferncombe_tamsin',
    title: 'What weight on the waste valve for 4 ft of fall?',
    body: 'The valve slams fast and delivery is poor. I added a washer and it got better, then it stopped.',
    tags: ['tuning'],
    daysAgo: 21,
    answers: [
      {
        author: 'quarry_lane_valves',
        hoursLater: 8,
        body: 'Change one thing at a time and time the beats. A longer stroke and a little more weight slow the beat and let the drive pipe water gather speed; too much and the valve will not close at all.',
      },
    ],
  },
  {
    author: 'highcrag_shepherd',
    title: 'Do I need a permit to take water from the beck?',
    body: 'It is on our land but flows on to the neighbour’s.',
    tags: ['water-rights'],
    daysAgo: 24,
    answers: [
      {
        author: 'moss_moderator',
        hoursLater: 5,
        body: 'That depends entirely on where you are. Ask the authority that issues water abstraction or diversion permits in your area before you build; many places limit how much of a stream you may take even on your own land.',
      },
    ],
  },
  {
    author: 'sorrel_cabin',
    title: 'Can a lower pump feed a tank that runs a second pump higher up?',
    body: 'The cabin is 90 ft above the creek and I only have 5 ft of fall. One pump cannot reach.',
    tags: ['staged'],
    daysAgo: 27,
    answers: [],
  },
  {
    author: 'ferncombe_tamsin',
    title: 'Air chamber keeps water-logging after a week',
    body: 'The delivery gets jerky and the pump bangs. Draining the chamber fixes it for a few days.',
    tags: ['stall', 'tuning'],
    daysAgo: 30,
    answers: [
      {
        author: 'ironwheel_builds',
        hoursLater: 12,
        body: 'Check the snifter hole just below the delivery valve; it may be blocked. It lets a little air in each cycle to keep the chamber charged. Never use glass or unrated parts for the chamber — it holds stored energy.',
      },
    ],
  },
  {
    author: 'highcrag_shepherd',
    title: 'Overflow from the paddock tank is washing out the track',
    body: 'The trough tank overflows all night. Where should the overflow go?',
    tags: ['storage', 'livestock'],
    daysAgo: 33,
    answers: [],
  },
  {
    author: 'sorrel_cabin',
    title: 'Black HDPE drive pipe — pump barely runs',
    body: 'I used a roll of HDPE for the drive pipe because it was what I had. The pump thumps weakly.',
    tags: ['drive-pipe', 'stall'],
    daysAgo: 36,
    answers: [
      {
        author: 'quarry_lane_valves',
        hoursLater: 9,
        body: 'Flexible pipe soaks up the pressure wave the pump lives on. Use rigid pipe — galvanised steel or pressure-rated PVC — for the drive pipe and keep the HDPE for the delivery line.',
      },
    ],
  },
];

/** Experts' safety checks on the guides. The drive pipe's are stale: the guide changed after them. */
export const demoSafetyChecks: {
  guide: string;
  expert: string;
  verdict: 'sound' | 'needs changes';
  notes: string;
  /** For a check on the text now: how long ago (never before the guide's "updated" day). */
  daysAgo?: number;
  /**
   * A check made on an earlier wording, which carried its own "updated" day: the seed
   * rebuilds that wording from the file now by leaving out the sections named and putting
   * back the sentences replaced since, and dates the check `checkedDaysLater` after that day.
   */
  earlier?: { updated: string; checkedDaysLater: number; without?: string[]; was?: [now: string, then: string][] };
}[] = [
  {
    guide: 'how-a-ram-pump-works',
    expert: 'ironwheel_builds',
    verdict: 'sound',
    daysAgo: 6,
    notes: 'Cycle description matches what I see on the bench. The air chamber caution is in the right place.',
  },
  {
    guide: 'the-drive-pipe',
    expert: 'quarry_lane_valves',
    verdict: 'needs changes',
    earlier: {
      updated: '2026-10-20',
      checkedDaysLater: 2,
      without: ['## Water hammer'],
      was: [['Two elbows cost more still.', 'Elbows cost a little.']],
    },
    notes: 'Needs a plain statement that a flexible drive pipe soaks up the surge, and a caution on pressure ratings.',
  },
  {
    guide: 'the-drive-pipe',
    expert: 'quarry_lane_valves',
    verdict: 'sound',
    earlier: {
      updated: '2026-11-12',
      checkedDaysLater: 1,
      was: [['Two elbows cost more still.', 'Elbows cost a little.']],
    },
    notes: 'Surge caution added; the length guidance now says where sources disagree.',
  },
  {
    guide: 'first-start-and-tuning',
    expert: 'ironwheel_builds',
    verdict: 'sound',
    daysAgo: 9,
    notes: 'One change at a time, timed beats: good advice. Stand clear of the waste valve on first start.',
  },
  {
    guide: 'care-frost-floods-and-water-rights',
    expert: 'quarry_lane_valves',
    verdict: 'sound',
    daysAgo: 3,
    notes: 'Drinking-water and permit sections defer to the right authorities.',
  },
  {
    guide: 'will-a-ram-meet-my-demand',
    expert: 'ironwheel_builds',
    verdict: 'needs changes',
    daysAgo: 12,
    notes: 'The livestock figures are per head per day; say that hot weather can double them.',
  },
];

/** Saved worked calculations; fixed ids so README and tests can link to them. */
export const demoCalculations: {
  publicId?: string;
  tool: CalculatorId;
  title: string;
  author: string;
  daysAgo: number;
  inputs: Record<string, string>;
}[] = [
  {
    publicId: 'FerncombeY1',
    tool: 'yield-estimate',
    title: 'Ferncombe: one ½-inch pump at 29 ft',
    author: 'ironwheel_builds',
    daysAgo: 2,
    inputs: { fall: '4 ft', lift: '29 ft', driveFlow: '2 gal/min', pumpType: 'homemade' },
  },
  {
    publicId: 'HighcragAP2',
    tool: 'array-planner',
    title: 'Highcrag far paddock: two ½-inch pumps side by side',
    author: 'quarry_lane_valves',
    daysAgo: 5,
    inputs: {
      mode: 'parallel',
      pumps: '2',
      fall: '4 ft',
      lift: '30 ft',
      driveFlowEach: '2 gal/min',
      driveLength: '24 ft',
      driveSize: '1/2',
      driveMaterial: 'pvc-sch40',
      extraElbows: '0',
      deliveryLength: '300 ft',
      deliverySize: '3/4',
      deliveryMaterial: 'hdpe-dr11',
      sourceFlow: '8 gal/min',
    },
  },
  {
    publicId: 'SorrelDL400',
    tool: 'delivery-line',
    title: 'Sorrel Creek cabin: 400 ft of ½-inch line',
    author: 'ironwheel_builds',
    daysAgo: 17,
    inputs: { flow: '1 L/min', lift: '45 ft', length: '400 ft', size: '1/2', material: 'hdpe-dr11' },
  },
];
