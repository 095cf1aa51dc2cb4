/**
 * The plan's parts list as a reader takes it to the merchant: each row's size, how many
 * and how much, in the reader's units, and the same rows as CSV. Pure, no framework.
 */
import {
  NOMINAL_LABELS,
  PIPE_ALLOWANCE,
  SCREEN_APPROACH_VELOCITY,
  SNIFTER_HOLE,
  type PartGroup,
  type PartsListItem,
  type SitePlanResults,
  type UnitSystem,
} from '@/lib/hydraulics';
import { formatQuantity } from '@/lib/calculators/format';
import { SERIES_LABELS } from '@/lib/calculators/pipes';

export const GROUP_WORDS: Record<PartGroup, string> = {
  intake: 'Intake',
  supply: 'Supply',
  drive: 'Drive pipe',
  pump: 'Pump',
  delivery: 'Delivery line',
  storage: 'Storage',
};

export interface PartRow {
  group: string;
  what: string;
  size: string;
  quantity: number;
  /** length, volume, area, pressure or bore, in the reader's units; '' when the part has none */
  amount: string;
  note: string;
}

/** What to buy of one part, beyond how many: a pipe's length, a tank's volume, a gauge's scale. */
function amountOf(p: PartsListItem, units: UnitSystem): string {
  if (p.lengthM !== undefined) return `${formatQuantity('length', p.lengthM, units)} long`;
  if (p.volumeM3 !== undefined) return formatQuantity('volume', p.volumeM3, units);
  if (p.areaM2 !== undefined) return `${formatQuantity('area', p.areaM2, units)} open`;
  if (p.diameterM !== undefined) return `${formatQuantity('smallLength', p.diameterM, units)} across`;
  if (p.pressurePa !== undefined) return `${formatQuantity('pressure', p.pressurePa, units)}`;
  return '';
}

export function partRows(parts: readonly PartsListItem[], units: UnitSystem): PartRow[] {
  return parts.map((p) => ({
    group: GROUP_WORDS[p.group],
    what: p.name,
    size: [p.nominal ? NOMINAL_LABELS[p.nominal] : '', p.series ? SERIES_LABELS[p.series] : '']
      .filter(Boolean)
      .join(' '),
    quantity: p.quantity,
    amount: amountOf(p, units),
    // a rule's source belongs with the plan's sources, not on each row
    note: p.note && !SOURCE_NOTES.has(p.note) ? p.note : '',
  }));
}

const SOURCE_NOTES = new Set<string>([PIPE_ALLOWANCE.source, SNIFTER_HOLE.source, SCREEN_APPROACH_VELOCITY.source]);

/** Where the plan's rules come from, each once, for its Sources. */
export function planSources(r: SitePlanResults): string[] {
  const lines = [
    `Drive flow by pump size: ${r.pump.driveFlowSource}`,
    `Intake screen approach velocity: ${SCREEN_APPROACH_VELOCITY.source}`,
    `Air chamber: ${r.airChamberRule}`,
    `Snifter hole: ${r.snifterSource}`,
    `Pipe lengths to buy: ${PIPE_ALLOWANCE.source}`,
  ];
  return [...new Set(lines)];
}

/** A cell as RFC 4180 writes it: quoted when it holds a comma, a quote or a line break. */
const cell = (s: string | number) => {
  // a spreadsheet would run a cell starting with = + - @ as a formula
  const t = String(s).replace(/^[=+\-@]/, "'$&");
  return /[",\n\r]/.test(t) ? `"${t.replace(/"/g, '""')}"` : t;
};

/** The rows as CSV with a header line, for a spreadsheet or the merchant. */
export function partsCsv(rows: readonly PartRow[]): string {
  const head = ['part of', 'what', 'size', 'quantity', 'amount', 'note'];
  const lines = rows.map((r) => [r.group, r.what, r.size, r.quantity, r.amount, r.note].map(cell).join(','));
  return [head.join(','), ...lines].join('\r\n') + '\r\n';
}
