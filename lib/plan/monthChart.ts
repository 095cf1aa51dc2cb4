/**
 * The month-by-month chart's layout: one bar a month for what the pumps deliver a day,
 * a step line for what is needed, months short of the need flagged (the view hatches
 * them, so the mark does not rest on colour). One unit for the whole axis, chosen as a
 * person would write the largest value, and round ticks (lib/charts). Pure, no framework.
 */
import { fromSI, readableDisplay, type MonthlyDelivery, type UnitSystem } from '@/lib/hydraulics';
import { formatNumber } from '@/lib/calculators/format';
import { MONTH_NAMES } from '@/lib/dates';
import { textWidth, verticalTicks, wrapText, type AxisTicks } from '@/lib/charts/layout';

export interface MonthBar {
  month: number;
  /** drawn under the bar: 'Jan', or 'J' where three letters do not fit */
  tick: string;
  name: string;
  /** in the axis unit */
  delivered: number;
  needed: number;
  short: boolean;
  /** its words, for the bar's accessible name and its readout */
  words: string;
  x: number;
  width: number;
  /** the slot the bar sits in, for the need's step line */
  slotX: number;
  slotWidth: number;
  top: number;
  height: number;
  needY: number;
}

export interface MonthChartLayout {
  width: number;
  height: number;
  /** the axis unit as the reader sees it, e.g. 'US gal/day' */
  unit: string;
  yTitle: string[];
  ticks: AxisTicks;
  plot: { left: number; top: number; width: number; height: number };
  /** y of each tick value */
  tickY: number[];
  bars: MonthBar[];
  shortMonths: string[];
}

/**
 * Lays the chart out at `width` px, `height` px tall, text at `font` px with lines `line` apart.
 * Bars fill two thirds of their month's slot; the month names shorten to initials when the
 * widest three-letter name and a small gap would not fit the slot.
 */
export function monthChartLayout(
  monthly: MonthlyDelivery,
  units: UnitSystem,
  width: number,
  { height = 230, font = 12, line = 15 }: { height?: number; font?: number; line?: number } = {},
): MonthChartLayout {
  const siValues = monthly.months.flatMap((m) => [m.deliveredM3PerDay, m.demandM3PerDay]);
  const largest = Math.max(0, ...siValues.filter(Number.isFinite));
  const d = readableDisplay('dailyVolume', largest || 1, units);
  const of = (si: number) => fromSI(si, d.unit, 'dailyVolume');
  const say = (v: number) => `${formatNumber(v)} ${d.label}`;

  const yTitle = wrapText(`Water a day (${d.label})`, width - 4, font);
  const top = yTitle.length * line + 10;
  const bottom = line + 8;
  const plotH = Math.max(60, height - top - bottom);
  const ticks = verticalTicks(0, of(largest) || 1, plotH, font);
  const left = Math.ceil(ticks.labelWidth) + 10;
  const plotW = Math.max(60, width - left - 4);
  const sy = (v: number) => top + plotH - ((v - ticks.min) / (ticks.max - ticks.min || 1)) * plotH;

  const slot = plotW / Math.max(1, monthly.months.length);
  const short3 = textWidth('May', font) <= slot - 4 && textWidth('Sep', font) <= slot - 4;
  const bars: MonthBar[] = monthly.months.map((m, i) => {
    const name = MONTH_NAMES[m.month - 1] ?? String(m.month);
    const delivered = of(m.deliveredM3PerDay);
    const needed = of(m.demandM3PerDay);
    const short = m.deliveredM3PerDay < m.demandM3PerDay;
    const w = Math.max(2, slot * (2 / 3));
    const slotX = left + i * slot;
    const y = sy(Math.max(0, delivered));
    return {
      month: m.month,
      tick: short3 ? name.slice(0, 3) : name.slice(0, 1),
      name,
      delivered,
      needed,
      short,
      words: `${name}: delivers ${say(delivered)}, needs ${say(needed)}${short ? ', short of the need' : ''}`,
      x: slotX + (slot - w) / 2,
      width: w,
      slotX,
      slotWidth: slot,
      top: y,
      height: Math.max(0, top + plotH - y),
      needY: sy(needed),
    };
  });
  return {
    width,
    height,
    unit: d.label,
    yTitle,
    ticks,
    plot: { left, top, width: plotW, height: plotH },
    tickY: ticks.values.map(sy),
    bars,
    shortMonths: bars.filter((b) => b.short).map((b) => b.name),
  };
}
