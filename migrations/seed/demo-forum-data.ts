/**
 * More invented threads for the demo forum, across the whole job. Site sheets are
 * as a member would type them; `fixed` names the answer (by index) that fixed it
 * and the asker's one line saying what fixed it.
 */
type DemoThread = {
  author: string;
  title: string;
  body: string;
  tags: string[];
  daysAgo: number;
  siteSheet?: Record<string, string>;
  photo?: { alt: string; caption: string };
  answers: { author: string; body: string; hoursLater: number; calculation?: string; helpfulFrom?: string[] }[];
  /** the answer (by index) that fixed it, and the asker's line saying what the fix was */
  fixed?: { answer: number; line: string };
  replies?: { author: string; body: string; toAnswer?: number; hoursLater: number }[];
};

export const demoThreads: DemoThread[] = [
  {
    author: 'ferncombe_tamsin',
    title: 'Second pump added, delivery only went up a little',
    body: 'We put a second ½" pump beside the first on the Linnet Brook, same fall, each with its own drive pipe. The tank fills faster but not twice as fast. The new drive pipe has an extra elbow where it dodges a rock.',
    tags: ['parallel', 'drive-pipe'],
    daysAgo: 1,
    siteSheet: {
      fall: '4 ft',
      lift: '29 ft',
      driveLength: '24 ft',
      driveSize: '1/2',
      driveMaterial: 'pvc-sch40',
      elbows: '1',
      pumpSize: '1/2',
      pumps: '2',
      driveFlow: '2 gal/min',
      delivered: '850 mL/min',
      symptoms: 'weak-delivery',
    },
    photo: {
      alt: 'Two small rams side by side on a stone sill, one drive pipe bending round a rock',
      caption: 'Ferncombe: two pumps',
    },
    answers: [
      {
        author: 'quarry_lane_valves',
        hoursLater: 5,
        calculation: 'HighcragAP2',
        body: 'That elbow costs the second pump part of its fall every beat. The array planner puts two matched pumps near double one; with one elbow a bit less. Straighten the pipe if you can, or move the pump so the run is straight.',
        helpfulFrom: ['ferncombe_tamsin', 'highcrag_shepherd'],
      },
      {
        author: 'highcrag_shepherd',
        hoursLater: 20,
        body: 'Ours went from one to two and nearly doubled, but both drive pipes are dead straight.',
      },
    ],
    fixed: { answer: 0, line: 'Moved the pump a yard upstream so the second drive pipe runs straight, no elbow' },
    replies: [
      {
        author: 'ferncombe_tamsin',
        toAnswer: 0,
        hoursLater: 30,
        body: 'Moved the pump a yard upstream, no elbow now. Nearly double. Thank you.',
      },
    ],
  },
  {
    author: 'sorrel_cabin',
    title: 'How many lower pumps to keep an upper one running all day?',
    body: 'Planning two stages for the cabin: lower pumps fill a barrel 30 ft up, an upper pump drives from that barrel to the cabin. How do I work out how many lower pumps I need?',
    tags: ['staged'],
    daysAgo: 3,
    answers: [
      {
        author: 'ironwheel_builds',
        hoursLater: 4,
        body: 'The upper pump uses its drive flow around the clock; the lower pumps together must deliver at least that much into the barrel. Divide the upper drive flow by what one lower pump delivers at its lift, and round up. The array planner does this in stages mode.',
        helpfulFrom: ['sorrel_cabin'],
      },
    ],
    fixed: { answer: 0, line: 'Divided the upper pump’s drive flow by one lower pump’s delivery and rounded up' },
  },
  {
    author: 'highcrag_shepherd',
    title: 'Pump bangs hard and the PVC fittings creak',
    body: 'Every beat is a loud bang and the tee at the pump flexes. Is this normal?',
    tags: ['tuning', 'drive-pipe'],
    daysAgo: 4,
    siteSheet: {
      fall: '6 ft',
      lift: '40 ft',
      driveLength: '40 ft',
      driveSize: '1',
      driveMaterial: 'pvc-sch40',
      pumpSize: '1',
      pumps: '1',
      bpm: '35',
      symptoms: 'hammering',
    },
    photo: {
      alt: 'A one-inch ram on a concrete pad with a PVC tee at the pump body',
      caption: 'Highcrag: the tee that creaks',
    },
    answers: [
      {
        author: 'quarry_lane_valves',
        hoursLater: 2,
        body: 'A slow, heavy beat means a long stroke; the surge grows with the speed the water reaches. Check the pressure rating of every fitting against the surge in the drive pipe check, shorten the stroke, and stand clear while you test. Never use unrated parts here.',
        helpfulFrom: ['highcrag_shepherd', 'ferncombe_tamsin'],
      },
    ],
    fixed: { answer: 0, line: 'Shortened the waste valve stroke and swapped the tee for a pressure-rated one' },
  },
  {
    author: 'ferncombe_tamsin',
    title: 'Measuring the brook in August: bucket or weir?',
    body: 'The brook is low in August and I want a proper figure for what it can spare. Is a bucket at a small fall good enough?',
    tags: ['survey'],
    daysAgo: 6,
    answers: [
      {
        author: 'ironwheel_builds',
        hoursLater: 6,
        body: 'A bucket and stopwatch works where you can catch the whole flow; time five fills and use the spread. For a wider stream a V-notch board gives a steadier number. Either way, measure in the driest weeks.',
      },
    ],
    replies: [
      { author: 'highcrag_shepherd', hoursLater: 9, body: 'We used a 90° notch in a plank and a ruler. Easy.' },
    ],
  },
  {
    author: 'sorrel_cabin',
    title: 'Delivery valve clatters and the delivery is poor',
    body: 'The check valve rattles and only a trickle reaches the tank.',
    tags: ['stall', 'tuning'],
    daysAgo: 8,
    siteSheet: {
      fall: '5 ft',
      lift: '45 ft',
      driveLength: '25 ft',
      driveSize: '3/4',
      driveMaterial: 'steel-sch40',
      pumpSize: '3/4',
      pumps: '1',
      symptoms: 'weak-delivery',
    },
    answers: [
      {
        author: 'quarry_lane_valves',
        hoursLater: 3,
        body: 'Open it up and look for grit on the seat or a worn flap. A leaking delivery valve lets the chamber push water back every beat.',
        helpfulFrom: ['sorrel_cabin'],
      },
    ],
    fixed: { answer: 0, line: 'Cleaned grit off the delivery valve seat and fitted a new rubber flap' },
  },
  {
    author: 'highcrag_shepherd',
    title: 'Trough float valve shut, pump keeps going — is that safe?',
    body: 'When the float valve on the trough closes, the ram keeps beating. Where does the water go?',
    tags: ['storage', 'livestock'],
    daysAgo: 10,
    answers: [
      {
        author: 'ironwheel_builds',
        hoursLater: 8,
        body: 'With the delivery shut the pressure climbs every beat. Put the float valve on a trough fed from an overflowing tank instead, or fit a relief the pump can push through. Do not let a closed valve dead-head the pump.',
        helpfulFrom: ['highcrag_shepherd'],
      },
    ],
    fixed: {
      answer: 0,
      line: 'Float valve moved to a trough fed from the overflowing tank; the pump never dead-heads',
    },
  },
  {
    author: 'ferncombe_tamsin',
    title: 'Snifter valve: how big a hole?',
    body: 'Building a new pump. How big should the snifter hole be?',
    tags: ['tuning'],
    daysAgo: 13,
    answers: [
      {
        author: 'quarry_lane_valves',
        hoursLater: 5,
        body: 'Small: a pin-sized hole just below the delivery valve is enough on a small pump. Too big and it spits water and air every beat; too small and the chamber water-logs over the weeks.',
      },
    ],
  },
  {
    author: 'sorrel_cabin',
    title: 'Can I use garden hose for the drive pipe for a season?',
    body: 'Only need water for a summer.',
    tags: ['drive-pipe'],
    daysAgo: 16,
    answers: [
      {
        author: 'ironwheel_builds',
        hoursLater: 2,
        body: 'It will barely beat: the hose swells and soaks up the pulse. Use rigid pipe for the drive and the hose for the delivery.',
        helpfulFrom: ['sorrel_cabin'],
      },
    ],
    fixed: { answer: 0, line: 'Rigid pipe for the drive, the garden hose kept for the delivery only' },
  },
  {
    author: 'highcrag_shepherd',
    title: 'Flood took the intake screen — what now?',
    body: 'A spate last week ripped out the intake screen and filled the drive pipe with gravel.',
    photo: {
      alt: 'The intake pool after a flood, the screen gone and gravel over the drive pipe mouth',
      caption: 'Highcrag: after the spate',
    },
    tags: ['stall'],
    daysAgo: 19,
    answers: [
      {
        author: 'quarry_lane_valves',
        hoursLater: 12,
        body: 'Wait for the water to drop; never work alone in high water. Flush the drive pipe from the top, check both valves for grit, and anchor the new screen to something that will not move.',
      },
    ],
  },
  {
    author: 'ferncombe_tamsin',
    title: 'Testing the water before it goes to the kitchen',
    body: 'What tests should I ask the lab for?',
    tags: ['drinking-water'],
    daysAgo: 22,
    answers: [
      {
        author: 'moss_moderator',
        hoursLater: 4,
        body: 'Ask an accredited laboratory and your local health authority: they will say what to test for where you are. Treat it as untreated surface water until they say otherwise.',
      },
    ],
  },
  {
    author: 'sorrel_cabin',
    title: 'Burying the delivery line: how deep for frost?',
    body: 'The line to the cabin crosses a north slope that freezes hard.',
    tags: ['frost', 'delivery-line'],
    daysAgo: 25,
    answers: [
      {
        author: 'ironwheel_builds',
        hoursLater: 10,
        body: 'Below your local frost depth: ask the local building authority for the figure. Where you cannot bury it, drain it for the winter.',
      },
    ],
  },
  {
    author: 'highcrag_shepherd',
    title: 'Tank overflow pipe size',
    body: 'Ram delivers about a litre a minute into a 1,500 L tank. What size overflow?',
    tags: ['storage'],
    daysAgo: 28,
    answers: [
      {
        author: 'quarry_lane_valves',
        hoursLater: 7,
        body: 'At a litre a minute almost anything will carry it; use at least the size of the delivery pipe so it never backs up, and lead it away from the tank base.',
      },
    ],
    fixed: { answer: 0, line: 'Overflow pipe the same size as the delivery, led away from the tank base' },
  },
  {
    author: 'ferncombe_tamsin',
    title: 'Pump never starts after I moved it',
    body: 'Moved the pump two yards downstream, now it will not start at all. The drive pipe is the same.',
    tags: ['stall'],
    daysAgo: 31,
    siteSheet: {
      fall: '4 ft',
      lift: '29 ft',
      driveLength: '24 ft',
      driveSize: '1/2',
      driveMaterial: 'pvc-sch40',
      pumpSize: '1/2',
      pumps: '1',
      symptoms: 'never-starts',
    },
    answers: [
      {
        author: 'ironwheel_builds',
        hoursLater: 3,
        body: 'Check the waste valve outlet is not under water at the new spot, and that the new joint does not let air in at a high point.',
        helpfulFrom: ['ferncombe_tamsin'],
      },
    ],
    fixed: { answer: 0, line: 'Raised the pump so the waste valve outlet sits clear of the water' },
  },
  {
    author: 'sorrel_cabin',
    title: 'What efficiency should I expect from a home-built pump?',
    body: 'Getting about half a litre a minute from 2 gallons a minute of drive water at a 7:1 lift.',
    tags: ['tuning'],
    daysAgo: 34,
    answers: [
      {
        author: 'quarry_lane_valves',
        hoursLater: 6,
        calculation: 'FerncombeY1',
        body: 'That is about what a home-built pump does at that ratio. Here is the yield estimate for those numbers; change them to yours.',
      },
    ],
  },
  {
    author: 'highcrag_shepherd',
    title: 'Water rights: the neighbour is downstream',
    body: 'Do I need to tell the neighbour before I put in a ram?',
    tags: ['water-rights'],
    daysAgo: 37,
    answers: [
      {
        author: 'moss_moderator',
        hoursLater: 9,
        body: 'Ask the authority that issues water permits where you are; many places require notice and limit the share of the flow you may take. The waste water returns to the stream, but the delivered part does not.',
      },
    ],
  },
  {
    author: 'ferncombe_tamsin',
    title: 'Delivery stopped during the cold snap',
    body: 'Three nights below freezing and nothing reaches the tank.',
    tags: ['frost', 'stall'],
    daysAgo: 40,
    siteSheet: {
      fall: '4 ft',
      lift: '29 ft',
      driveLength: '24 ft',
      driveSize: '1/2',
      driveMaterial: 'pvc-sch40',
      pumpSize: '1/2',
      pumps: '1',
      symptoms: 'delivery-stops-in-frost',
    },
    answers: [
      {
        author: 'quarry_lane_valves',
        hoursLater: 4,
        body: 'Most likely an exposed stretch of the delivery line froze. Thaw it gently and check for splits; insulate or bury that run.',
      },
    ],
    fixed: { answer: 0, line: 'Thawed the exposed stretch of delivery line, then buried and insulated it' },
  },
  {
    author: 'sorrel_cabin',
    title: 'Using a pressure tank as the air chamber',
    body: 'I have an old well pressure tank. Can it be the air chamber?',
    tags: ['tuning'],
    daysAgo: 43,
    answers: [
      {
        author: 'ironwheel_builds',
        hoursLater: 5,
        body: 'Only if it is rated well above the pressure it will see, and in sound condition. An air chamber stores energy: never glass, never an unrated vessel.',
      },
    ],
  },
  {
    author: 'highcrag_shepherd',
    title: 'Does drive pipe diameter matter if the pump is ½"?',
    body: 'Could I run a 1" drive pipe into a ½" pump?',
    tags: ['drive-pipe'],
    daysAgo: 46,
    answers: [],
  },
  {
    author: 'ferncombe_tamsin',
    title: 'Best time of year to build',
    body: 'Planning to build next year. Spring or late summer?',
    tags: ['survey'],
    daysAgo: 49,
    answers: [
      {
        author: 'ironwheel_builds',
        hoursLater: 30,
        body: 'Late summer, when the stream is low and the banks are dry: safer to work and you see the driest flow.',
      },
    ],
  },
  {
    author: 'sorrel_cabin',
    title: 'Air chamber size for a ¾" pump',
    body: 'How big should the air chamber be?',
    tags: ['tuning'],
    daysAgo: 52,
    answers: [],
  },
  {
    author: 'highcrag_shepherd',
    title: '1-inch pump stops every dry spell when the creek drops',
    body: 'The 1" pump on the top creek runs all spring. In a dry spell the pool drops a few inches and within a day the waste valve stops shut. Clear it, it runs an hour, stops again. Drive pipe is 40 ft of 1¼" galvanised off a box in the pool.',
    tags: ['stall', 'drive-pipe'],
    daysAgo: 4,
    siteSheet: {
      fall: '6 ft',
      lift: '45 ft',
      driveLength: '40 ft',
      driveSize: '1-1/4',
      driveMaterial: 'steel-sch40',
      pumpSize: '1',
      pumps: '1',
      symptoms: 'stops-after-some-beats',
    },
    answers: [
      {
        author: 'ironwheel_builds',
        hoursLater: 5,
        body: 'When the pool drops, the top of the drive pipe gets close to the surface and a vortex pulls air in; the air cushions the surge and the pump stalls. Set the intake a foot or more below the lowest water you expect, or raise the pool with a low weir of stones. Do the work from the bank when the creek is low, and not alone.',
        helpfulFrom: ['highcrag_shepherd'],
      },
    ],
    fixed: { answer: 0, line: 'Lowered the intake box 14 inches below the dry-week water level' },
    replies: [
      {
        author: 'highcrag_shepherd',
        toAnswer: 0,
        hoursLater: 50,
        body: 'Lowered the intake box 14 inches. Ran through the whole dry week.',
      },
    ],
  },
];
