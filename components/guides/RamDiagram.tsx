import { AREA, LINE, PAPER, TEXT } from '@/components/drawing-colours';

/**
 * Our own section through a ram pump, for the guides: the parts, or one phase of a
 * beat. A server component (plain SVG, no script). MDX hands it strings only:
 * `<RamDiagram />` for the parts, `<RamDiagram phase="2" />` for a phase.
 *
 * Colours come from the palette through Tailwind classes with dark: variants, picked
 * so lines keep at least 3:1 and text at least 4.5:1 against the page and the cards
 * in both themes (ink creek-700 / limestone-200, water lines creek-400 / creek-300,
 * moving water clay-600 / clay-300). Every part carries a text label, so nothing is
 * told by colour alone.
 */

type Phase = 'parts' | '1' | '2' | '3' | '4';

interface PhaseText {
  title: string;
  caption: string;
  /** what the drawing shows, for a reader who cannot see it (the caption says what happens) */
  desc: string;
  /** the short note under the drawing, in the colour of moving water */
  note: string;
  wasteOpen: boolean;
  deliveryOpen: boolean;
  /** water moving along the drive pipe: towards the pump, back towards the source, or still */
  flow: 'in' | 'back' | 'none';
}

const PHASES: Record<Phase, PhaseText> = {
  parts: {
    title: 'The parts of a ram pump',
    caption:
      'The parts of a ram pump, in section: the drive pipe brings water from the source into the pump body; the waste valve lets it out; the delivery valve lets it up into the air chamber, and the delivery line takes it to the tank. The snifter is a tiny hole just below the delivery valve.',
    desc: "Section through the pump. The drive pipe comes in from the left and becomes the pump body. On top of the body, from left to right: the waste valve, its disc hanging open below its seat with a weight on its stem; the snifter, a tiny hole; and the air chamber, a tall closed vessel with air above water, with the delivery valve's disc resting over the hole in its floor. The delivery line leaves the air chamber to the right.",
    note: '',
    wasteOpen: true,
    deliveryOpen: false,
    flow: 'none',
  },
  '1': {
    title: 'Step 1: water speeds up',
    caption: 'Step 1: with the waste valve open, water speeds up down the drive pipe and runs out of the waste valve.',
    desc: 'The same section. Arrows run along the drive pipe towards the pump and spill out of the open waste valve; the delivery valve rests shut.',
    note: 'water speeds up →',
    wasteOpen: true,
    deliveryOpen: false,
    flow: 'in',
  },
  '2': {
    title: 'Step 2: the waste valve slams shut',
    caption: 'Step 2: the rushing water drags the waste valve up against its seat and it slams shut with a clack.',
    desc: "The waste valve's disc is pressed up against its seat, marked clack; the arrows in the drive pipe still point towards the pump; the delivery valve rests shut.",
    note: 'waste valve slams shut',
    wasteOpen: false,
    deliveryOpen: false,
    flow: 'in',
  },
  '3': {
    title: 'Steps 3 to 5: the pressure rise opens the delivery valve',
    caption:
      'Steps 3 to 5: the moving column cannot stop at once, the pressure in the body jumps, the delivery valve opens and water is pushed into the air chamber, squeezing its air.',
    desc: "The waste valve is shut; the delivery valve's disc is lifted off its seat with arrows going up into the air chamber, whose water stands higher and whose air is squeezed smaller.",
    note: 'pressure rises, water goes up',
    wasteOpen: false,
    deliveryOpen: true,
    flow: 'in',
  },
  '4': {
    title: 'Steps 6 to 8: recoil, a sip of air, and the waste valve reopens',
    caption:
      'Steps 6 to 8: the column recoils towards the source, the delivery valve closes, the snifter draws in a little air and the waste valve drops open for the next beat.',
    desc: "The arrow in the drive pipe points back towards the source; the delivery valve rests shut; an arrow goes in through the snifter with a small bubble below it; the waste valve's disc has dropped open again.",
    note: '← recoil, air in',
    wasteOpen: true,
    deliveryOpen: false,
    flow: 'back',
  },
};

/** Pump geometry (viewBox 360 × 220): the body's walls, the outlets cut in its top wall. */
const TOP = 140;
const BOTTOM = 166;
const END = 262;
const WASTE = { left: 96, right: 128, top: 104, seat: 114 };
const SNIFTER = 158;
const CHAMBER = { left: 190, right: 262, top: 30, holeLeft: 212, holeRight: 240 };
const PIPE_OUT = { top: 96, bottom: 110 };

export function RamDiagram({ phase = 'parts' }: { phase?: string }) {
  const key: Phase = phase in PHASES ? (phase as Phase) : 'parts';
  const p = PHASES[key];
  const id = `ram-${key}`;
  const level = p.deliveryOpen ? 64 : 78;
  const disc = p.wasteOpen ? 126 : WASTE.seat + 1;
  const dv = p.deliveryOpen ? 122 : TOP - 5;
  return (
    <figure className="not-prose my-6 max-w-md font-sans" data-ram-diagram={key}>
      <svg
        viewBox={`0 0 360 ${key === 'parts' ? 194 : 212}`}
        role="img"
        aria-labelledby={`${id}-title`}
        aria-describedby={`${id}-desc`}
        className={`h-auto w-full rounded-md border border-limestone-300 dark:border-creek-600 ${PAPER}`}
      >
        <title id={`${id}-title`}>{p.title}</title>
        <desc id={`${id}-desc`}>{p.desc}</desc>

        {/* water inside the drive pipe, body, waste outlet, chamber and delivery line */}
        <g className={AREA.water}>
          <rect x="0" y={TOP} width={END} height={BOTTOM - TOP} />
          <rect x={WASTE.left} y={WASTE.top} width={WASTE.right - WASTE.left} height={TOP - WASTE.top} />
          <rect x={CHAMBER.left} y={level} width={CHAMBER.right - CHAMBER.left} height={TOP - level} />
          <rect
            x={CHAMBER.right}
            y={PIPE_OUT.top}
            width={360 - CHAMBER.right}
            height={PIPE_OUT.bottom - PIPE_OUT.top}
          />
        </g>
        <path
          d={`M${CHAMBER.left} ${TOP} V48 Q${CHAMBER.left} ${CHAMBER.top} 208 ${CHAMBER.top} H244 Q${CHAMBER.right} ${CHAMBER.top} ${CHAMBER.right} 48 V${level} H${CHAMBER.left} Z`}
          className={AREA.air}
        />
        <line x1={CHAMBER.left} x2={CHAMBER.right} y1={level} y2={level} className={LINE.water} strokeWidth="2" />

        {/* walls: the body's top wall is cut for the waste outlet, the snifter and the chamber's hole */}
        <g className={LINE.ink} strokeWidth="3" fill="none" strokeLinecap="square">
          <path
            d={`M0 ${TOP} H${WASTE.left} V${WASTE.top} M${WASTE.right} ${WASTE.top} V${TOP} H${SNIFTER - 2} M${SNIFTER + 2} ${TOP} H${CHAMBER.holeLeft} M${CHAMBER.holeRight} ${TOP} H${END} V${BOTTOM} H0`}
          />
          <path
            d={`M${CHAMBER.left} ${TOP} V48 Q${CHAMBER.left} ${CHAMBER.top} 208 ${CHAMBER.top} H244 Q${CHAMBER.right} ${CHAMBER.top} ${CHAMBER.right} 48 V${PIPE_OUT.top} H360 M360 ${PIPE_OUT.bottom} H${CHAMBER.right} V${TOP}`}
          />
          {/* the waste valve's seat: two lips narrower than its disc */}
          <path d={`M${WASTE.left} ${WASTE.seat} H106 M118 ${WASTE.seat} H${WASTE.right}`} />
        </g>

        {/* waste valve: disc below the seat, stem through it, weight on top */}
        <g className={TEXT.ink}>
          <rect x="100" y={disc} width="24" height="4" />
          <rect x="111" y={disc - 40} width="2" height="40" />
          <rect x="104" y={disc - 50} width="16" height="10" rx="1" />
          {/* delivery valve: a disc over the chamber's hole */}
          <rect x="208" y={dv} width="36" height="4" />
        </g>

        <Labels wasteTop={disc - 50} snifterLeader={key !== '4'} />

        {key === 'parts' ? (
          <g className={TEXT.ink} fontSize="12">
            <text x="4" y="182">
              ← from the source
            </text>
          </g>
        ) : null}

        <PhaseMarks phase={key} p={p} />
      </svg>
      <figcaption className="cw-muted mt-2 text-sm leading-snug">{p.caption}</figcaption>
    </figure>
  );
}

function Labels({ wasteTop, snifterLeader }: { wasteTop: number; snifterLeader: boolean }) {
  return (
    <g className={TEXT.ink} fontSize="13">
      <text x="112" y={wasteTop - 8} textAnchor="middle">
        waste valve
      </text>
      <text x="4" y={TOP - 8}>
        drive pipe
      </text>
      <text x={SNIFTER} y="116" textAnchor="middle">
        snifter
      </text>
      {snifterLeader ? (
        <line x1={SNIFTER} x2={SNIFTER} y1="120" y2={TOP - 4} className={LINE.ink} strokeWidth="1.5" />
      ) : null}
      <text x={CHAMBER.right + 6} y="46">
        air chamber
      </text>
      <text x={(CHAMBER.left + CHAMBER.right) / 2} y="52" textAnchor="middle" fontSize="12">
        air
      </text>
      <text x={CHAMBER.right + 6} y={PIPE_OUT.top - 6}>
        delivery line
      </text>
      <text x={CHAMBER.right + 10} y={TOP + 8}>
        delivery
      </text>
      <text x={CHAMBER.right + 10} y={TOP + 23}>
        valve
      </text>
      <line x1="244" x2={CHAMBER.right + 6} y1={TOP - 3} y2={TOP + 4} className={LINE.ink} strokeWidth="1.5" />
    </g>
  );
}

/** Arrows and words for what moves in this phase. */
function PhaseMarks({ phase, p }: { phase: Phase; p: PhaseText }) {
  if (phase === 'parts') return null;
  const mid = (TOP + BOTTOM) / 2;
  return (
    <g>
      <defs>
        <marker
          id={`ram-arrow-${phase}`}
          viewBox="0 0 10 10"
          refX="8"
          refY="5"
          markerWidth="5"
          markerHeight="5"
          orient="auto"
        >
          <path d="M0 0 L10 5 L0 10 Z" className={TEXT.moving} />
        </marker>
      </defs>
      <g className={LINE.moving} strokeWidth="3" fill="none" markerEnd={`url(#ram-arrow-${phase})`}>
        {p.flow === 'in' ? <line x1="14" x2="80" y1={mid} y2={mid} /> : null}
        {p.flow === 'back' ? <line x1="80" x2="14" y1={mid} y2={mid} /> : null}
        {p.wasteOpen && p.flow === 'in' ? (
          <>
            <path d={`M${WASTE.left + 2} ${WASTE.top - 2} q-6 -6 -16 6`} />
            <path d={`M${WASTE.right - 2} ${WASTE.top - 2} q6 -6 16 6`} />
          </>
        ) : null}
        {p.deliveryOpen ? (
          <>
            <line x1="202" x2="202" y1={TOP - 6} y2={TOP - 36} />
            <line x1="250" x2="250" y1={TOP - 6} y2={TOP - 36} />
          </>
        ) : null}
        {phase === '4' ? <line x1={SNIFTER} x2={SNIFTER} y1="121" y2={TOP + 10} /> : null}
      </g>
      {phase === '2' ? (
        <text x={WASTE.right + 6} y="100" fontSize="13" fontWeight="700" className={TEXT.moving}>
          clack!
        </text>
      ) : null}
      {phase === '4' ? (
        <circle cx={SNIFTER + 8} cy={TOP + 14} r="3" className={`${LINE.ink} ${AREA.air}`} strokeWidth="1.5" />
      ) : null}
      <text x="4" y="200" fontSize="13" fontWeight="600" className={TEXT.moving}>
        {p.note}
      </text>
    </g>
  );
}
