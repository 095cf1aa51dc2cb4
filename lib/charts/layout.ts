/**
 * Text measurement and placement for charts drawn as plain SVG on the server, where no
 * font can be measured: widths are estimated on the generous side so a label laid out
 * here never runs into its neighbour or off the chart once the browser draws it.
 */
import { niceTicks, formatTick, type Ticks } from './ticks';

/** Ems per character of the system UI stack at its widest common glyphs (digits ≈ 0.55, capitals ≈ 0.65). */
const EM_PER_CHAR = 0.62;

/** Estimated width in px of a line of text at a font size in px. */
export function textWidth(text: string, fontSize: number): number {
  return [...text].length * fontSize * EM_PER_CHAR;
}

/** Text broken at spaces (and after '/' or '-' in a long word) into lines no wider than maxWidth. */
export function wrapText(text: string, maxWidth: number, fontSize: number): string[] {
  const maxChars = Math.max(4, Math.floor(maxWidth / (fontSize * EM_PER_CHAR)));
  const words = text.split(/\s+/).filter(Boolean);
  const lines: string[] = [];
  let line = '';
  for (const word of words) {
    const next = line ? `${line} ${word}` : word;
    if (next.length <= maxChars) {
      line = next;
      continue;
    }
    if (line) lines.push(line);
    line = word;
    // a single word wider than the chart is cut at the last break point that fits, else hard
    while (line.length > maxChars) {
      const cut = Math.max(line.lastIndexOf('/', maxChars - 1), line.lastIndexOf('-', maxChars - 1));
      const at = cut > 0 ? cut + 1 : maxChars;
      lines.push(line.slice(0, at));
      line = line.slice(at);
    }
  }
  if (line) lines.push(line);
  return lines;
}

export interface AxisTicks extends Ticks {
  labels: string[];
  /** Widest label, px. */
  labelWidth: number;
}

function labelled(t: Ticks, fontSize: number): AxisTicks {
  const labels = t.values.map((v) => formatTick(v, t.decimals));
  return { ...t, labels, labelWidth: Math.max(...labels.map((l) => textWidth(l, fontSize))) };
}

/**
 * Ticks along a horizontal axis of `length` px whose labels do not touch: the most
 * ticks (up to `most`) whose widest label plus a gap fits between neighbours.
 */
export function horizontalTicks(lo: number, hi: number, length: number, fontSize: number, most = 8): AxisTicks {
  const gap = fontSize;
  for (let count = most; count > 2; count--) {
    const t = labelled(niceTicks(lo, hi, count), fontSize);
    const spacing = length / Math.max(1, t.values.length - 1);
    if (spacing >= t.labelWidth + gap) return t;
  }
  const t = labelled(niceTicks(lo, hi, 2), fontSize);
  // two labels still too wide for the axis: keep the ends only, which sit at the corners
  if (length < t.labelWidth + gap) return { ...t, values: [t.min, t.max], labels: [t.labels[0]!, t.labels.at(-1)!] };
  return t;
}

/** Ticks up a vertical axis of `length` px, one per `spacing` px or fewer. */
export function verticalTicks(lo: number, hi: number, length: number, fontSize: number, spacing = 32): AxisTicks {
  const count = Math.min(6, Math.max(2, Math.floor(length / spacing)));
  return labelled(niceTicks(lo, hi, count), fontSize);
}

/** Whether two boxes [x, y, w, h] overlap (touching edges do not). */
export function overlaps(a: [number, number, number, number], b: [number, number, number, number]): boolean {
  return a[0] < b[0] + b[2] && b[0] < a[0] + a[2] && a[1] < b[1] + b[3] && b[1] < a[1] + a[3];
}

/**
 * Where to put a label of size w × h beside a point at (px, py) inside [0, width] × [0, height]:
 * above right if it fits, else above left, else below; always wholly inside the box.
 */
export function placeLabel(
  px: number,
  py: number,
  w: number,
  h: number,
  width: number,
  height: number,
  offset = 10,
): { x: number; y: number } {
  const x = px + offset + w <= width ? px + offset : Math.max(0, px - offset - w);
  const y = py - offset - h >= 0 ? py - offset - h : Math.min(height - h, py + offset);
  return { x: Math.min(Math.max(0, x), Math.max(0, width - w)), y: Math.max(0, y) };
}
