/**
 * The charts' colours, as Tailwind classes so dark mode follows the system like the rest
 * of the site. Each tone names its light and dark shade from the palette literally (Tailwind
 * only builds classes it finds written out); tests/unit/chart-contrast.test.ts reads these
 * strings and checks each pair against the card: text 4.5:1, lines and marks 3:1.
 */

export type ToneUse = 'text' | 'mark' | 'decoration';

export interface Tone {
  use: ToneUse;
  stroke: string;
  fill: string;
  /** For the HTML legend's swatches and words. */
  text: string;
}

const tone = (use: ToneUse, stroke: string, fill: string, text: string): Tone => ({ use, stroke, fill, text });

export const TONES = {
  /** Titles and the reader's own label. */
  ink: tone(
    'text',
    'stroke-creek-700 dark:stroke-limestone-200',
    'fill-creek-700 dark:fill-limestone-200',
    'text-creek-700 dark:text-limestone-200',
  ),
  /** Tick labels. */
  tick: tone(
    'text',
    'stroke-creek-500 dark:stroke-creek-200',
    'fill-creek-500 dark:fill-creek-200',
    'text-creek-500 dark:text-creek-200',
  ),
  axis: tone(
    'mark',
    'stroke-creek-400 dark:stroke-creek-300',
    'fill-creek-400 dark:fill-creek-300',
    'text-creek-400 dark:text-creek-300',
  ),
  /** Grid lines only guide the eye; the ticks and the table carry the values. */
  grid: tone(
    'decoration',
    'stroke-limestone-300 dark:stroke-creek-700',
    'fill-limestone-300 dark:fill-creek-700',
    'text-limestone-300 dark:text-creek-700',
  ),
  /** The card's own background, for halos behind labels. */
  card: tone(
    'decoration',
    'stroke-limestone-50 dark:stroke-creek-900',
    'fill-limestone-50 dark:fill-creek-900',
    'text-limestone-50 dark:text-creek-900',
  ),
  curve: tone(
    'mark',
    'stroke-clay-600 dark:stroke-clay-300',
    'fill-clay-600 dark:fill-clay-300',
    'text-clay-600 dark:text-clay-300',
  ),
  /** The reader's own point or bar. */
  mine: tone(
    'mark',
    'stroke-creek-800 dark:stroke-limestone-50',
    'fill-creek-800 dark:fill-limestone-50',
    'text-creek-800 dark:text-limestone-50',
  ),
  /** Everyone else's bars and points. */
  others: tone(
    'mark',
    'stroke-clay-500 dark:stroke-clay-400',
    'fill-clay-500 dark:fill-clay-400',
    'text-clay-500 dark:text-clay-400',
  ),
  bandEdge: tone(
    'mark',
    'stroke-moss-500 dark:stroke-moss-400',
    'fill-moss-500 dark:fill-moss-400',
    'text-moss-500 dark:text-moss-400',
  ),
  /** The band's fill is read through its edges and its legend entry. */
  bandFill: tone(
    'decoration',
    'stroke-moss-300 dark:stroke-moss-600',
    'fill-moss-300/40 dark:fill-moss-600/50',
    'text-moss-300 dark:text-moss-600',
  ),
  typical: tone(
    'mark',
    'stroke-moss-600 dark:stroke-moss-300',
    'fill-moss-600 dark:fill-moss-300',
    'text-moss-600 dark:text-moss-300',
  ),
  commercial: tone(
    'mark',
    'stroke-creek-400 dark:stroke-creek-300',
    'fill-creek-400 dark:fill-creek-300',
    'text-creek-400 dark:text-creek-300',
  ),
  tableA: tone(
    'mark',
    'stroke-creek-600 dark:stroke-creek-100',
    'fill-creek-600 dark:fill-creek-100',
    'text-creek-600 dark:text-creek-100',
  ),
  tableB: tone(
    'mark',
    'stroke-clay-700 dark:stroke-clay-200',
    'fill-clay-700 dark:fill-clay-200',
    'text-clay-700 dark:text-clay-200',
  ),
} as const satisfies Record<string, Tone>;

export type ToneName = keyof typeof TONES;

/** The card every chart sits on (globals.css .cw-card): limestone-50, creek-900 in dark mode. */
export const CARD_BACKGROUND = { light: 'limestone-50', dark: 'creek-900' } as const;
