/**
 * The colours of our own drawings (the ram diagram, the site sketch), as Tailwind
 * classes from the palette with their dark-mode twins. Written out in full so
 * Tailwind finds them; tests/unit/pictures.test.tsx holds every line to 3:1 and
 * every text to 4.5:1 against the paper and the water in both themes (WCAG 2.1,
 * 1.4.11 and 1.4.3).
 */

/** What the drawings stand on: the card's own background. */
export const PAPER = 'bg-limestone-50 dark:bg-creek-900';

/** Lines that carry a shape or a meaning. */
export const LINE = {
  ink: 'stroke-creek-700 dark:stroke-limestone-200',
  water: 'stroke-creek-400 dark:stroke-creek-300',
  ground: 'stroke-moss-600 dark:stroke-moss-300',
  /** water on the move: arrows */
  moving: 'stroke-clay-600 dark:stroke-clay-300',
} as const;

/** Words and arrowheads. */
export const TEXT = {
  ink: 'fill-creek-700 dark:fill-limestone-200',
  moving: 'fill-clay-600 dark:fill-clay-300',
} as const;

/** Areas inside lines: they help the eye, the lines around them carry the shape. */
export const AREA = {
  water: 'fill-creek-100 dark:fill-creek-700',
  air: 'fill-limestone-50 dark:fill-creek-950',
  paper: 'fill-limestone-50 dark:fill-creek-900',
} as const;
