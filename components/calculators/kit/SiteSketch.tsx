import { formatQuantity } from '@/lib/calculators/format';
import { readForm } from '@/lib/calculators/state';
import type { FieldDef, FormState } from '@/lib/calculators/types';
import type { UnitSystem } from '@/lib/hydraulics';
import { useUnits } from '@/components/units/UnitsProvider';
import { AREA, LINE, TEXT } from '@/components/drawing-colours';

/**
 * A sketch of the site beside a calculator's inputs: what the fall, the lift, the
 * drive pipe and the delivery line are, labelled with the values in the form as the
 * reader's units would write them, or with their plain names while a value is
 * missing. Drawn only for calculators that ask for at least one of them.
 */
export function SiteSketch({ fields, state }: { fields: readonly FieldDef[]; state: FormState }) {
  const { units } = useUnits();
  return <SiteSketchDrawing fields={fields} state={state} units={units} />;
}

type Part = 'fall' | 'lift' | 'drive' | 'delivery';

/** Which field holds each part: the engines' names, with or without the stall check's `site.` */
const PART_FIELDS: Record<Part, RegExp> = {
  fall: /^(site\.)?fallM$/,
  lift: /^(site\.)?liftM$/,
  drive: /^(site\.)?drivePipe\.lengthM$/,
  delivery: /^(site\.)?(deliveryLine|line)\.lengthM$/,
};

const NAMES: Record<Part, string> = { fall: 'fall', lift: 'lift', drive: 'drive pipe', delivery: 'delivery line' };

/** The form's value of one part in SI, when the field exists and reads as a positive length. */
function siValue(fields: readonly FieldDef[], state: FormState, part: Part): number | undefined {
  const field = fields.find((f) => f.type === 'quantity' && PART_FIELDS[part].test(f.name));
  if (!field) return undefined;
  const { values } = readForm([field], state);
  let v: unknown = values;
  for (const k of field.name.split('.')) v = (v as Record<string, unknown> | undefined)?.[k];
  return typeof v === 'number' && Number.isFinite(v) && v > 0 ? v : undefined;
}

/** The parts this calculator asks for, each with its value as written, if any. */
function sketchValues(fields: readonly FieldDef[], state: FormState, units: UnitSystem) {
  const asked = (Object.keys(PART_FIELDS) as Part[]).filter((p) =>
    fields.some((f) => f.type === 'quantity' && PART_FIELDS[p].test(f.name)),
  );
  const written = {} as Record<Part, string | undefined>;
  for (const p of Object.keys(PART_FIELDS) as Part[]) {
    const si = siValue(fields, state, p);
    written[p] = si === undefined ? undefined : formatQuantity('length', si, units);
  }
  return { asked, written };
}

/** Heights in the drawing (viewBox 360 × 200): the source's surface, the pump, the outlet at the tank. */
const SURFACE = 62;
const PUMP = 164;
const OUTLET = 22;

export function SiteSketchDrawing({
  fields,
  state,
  units,
}: {
  fields: readonly FieldDef[];
  state: FormState;
  units: UnitSystem;
}) {
  const { asked, written } = sketchValues(fields, state, units);
  if (asked.length === 0) return null;
  const say = (p: Part, how: string) => `${NAMES[p]}${written[p] ? ` ${written[p]}` : ''} ${how}`;
  const label = `Site sketch: ${[
    say('fall', 'from the source’s surface down to the pump'),
    say('drive', 'from the intake down to the pump'),
    say('lift', 'from the pump up to the outlet at the tank'),
    say('delivery', 'from the pump up to the tank'),
  ].join('; ')}.`;
  return (
    <figure className="m-0" data-site-sketch>
      <svg
        viewBox="0 0 360 200"
        role="img"
        aria-label={label}
        className="h-auto w-full max-w-md font-sans"
        data-testid="site-sketch"
      >
        <title>{label}</title>
        {/* the pond at the source, and the ground: down to the pump, up to the tank */}
        <path d={`M16 ${SURFACE} L22 84 H78 L84 ${SURFACE} Z`} className={AREA.water} />
        <line x1="14" x2="86" y1={SURFACE} y2={SURFACE} className={LINE.water} strokeWidth="2" />
        <path
          d={`M0 ${SURFACE} H12 L22 86 H78 L90 ${SURFACE} L150 170 H200 L290 52 H360`}
          className={LINE.ground}
          strokeWidth="2.5"
          fill="none"
          strokeLinejoin="round"
        />
        {/* pipes: drive pipe from the intake down to the pump, delivery line up and over the tank's rim */}
        <g className={LINE.ink} strokeWidth="5" fill="none" strokeLinecap="round" strokeLinejoin="round">
          <path d={`M64 78 H94 L154 ${PUMP}`} />
          <path d={`M186 ${PUMP - 2} H204 L284 46 L300 12 H318 V${OUTLET + 4}`} />
        </g>
        {/* the pump: body, air chamber; the tank */}
        <g className={LINE.ink} strokeWidth="2.5">
          <rect x="154" y="156" width="34" height="14" rx="2" className={AREA.paper} />
          <rect x="172" y="136" width="13" height="20" rx="4" className={AREA.paper} />
          <rect x="300" y="24" width="44" height="28" rx="2" className={AREA.paper} />
        </g>
        {/* dimension lines: fall on the left, lift on the right, to the pump's level */}
        <g className={LINE.ink} strokeWidth="1.2" strokeDasharray="4 3">
          <line x1="2" x2="14" y1={SURFACE} y2={SURFACE} />
          <line x1="2" x2="150" y1={PUMP} y2={PUMP} />
          <line x1="192" x2="358" y1={PUMP} y2={PUMP} />
          <line x1="322" x2="358" y1={OUTLET} y2={OUTLET} />
        </g>
        <g className={LINE.ink} strokeWidth="1.5">
          <Arrow x={7} from={SURFACE} to={PUMP} />
          <Arrow x={352} from={PUMP} to={OUTLET} />
        </g>
        <g className={TEXT.ink} fontSize="14">
          <text x="50" y="54" textAnchor="middle">
            source
          </text>
          <text x="171" y="188" textAnchor="middle">
            pump
          </text>
          <text x="322" y="43" textAnchor="middle">
            tank
          </text>
          <Label part="fall" x={14} y={102} anchor="start" value={written.fall} />
          <Label part="drive" x={114} y={140} anchor="end" value={written.drive} />
          <Label part="delivery" x={238} y={88} anchor="end" value={written.delivery} />
          <Label part="lift" x={344} y={104} anchor="end" value={written.lift} />
        </g>
      </svg>
    </figure>
  );
}

function Label({
  part,
  x,
  y,
  anchor,
  value,
}: {
  part: Part;
  x: number;
  y: number;
  anchor: 'start' | 'end';
  value: string | undefined;
}) {
  return (
    <text x={x} y={y} textAnchor={anchor} data-sketch-part={part}>
      <tspan x={x}>{NAMES[part]}</tspan>
      {value ? (
        <tspan x={x} dy="17" fontWeight="600" className="cw-num">
          {value}
        </tspan>
      ) : null}
    </text>
  );
}

/** A dimension line with a head at each end. */
function Arrow({ x, from, to }: { x: number; from: number; to: number }) {
  const d = Math.sign(to - from) * 6;
  return (
    <>
      <line x1={x} x2={x} y1={from} y2={to} />
      <path d={`M${x - 4} ${from + d} L${x} ${from} L${x + 4} ${from + d}`} fill="none" />
      <path d={`M${x - 4} ${to - d} L${x} ${to} L${x + 4} ${to - d}`} fill="none" />
    </>
  );
}
