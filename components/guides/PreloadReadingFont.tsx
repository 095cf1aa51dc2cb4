import { readdirSync } from 'node:fs';
import path from 'node:path';
import { preload } from 'react-dom';

/**
 * Asks the browser for the guide's reading type (Literata, Latin letters, regular and
 * semibold) from the page's head. Without it the font is requested only once the
 * page's first layout finds text set in it, and on a slow phone the guide's first
 * paragraph, its largest paint, waits for that round trip. The files are the ones the
 * @fontsource stylesheet names, under the hashed names the build gave them; found at
 * build time (guides are static), and if the build has none, nothing is preloaded.
 */
const WANTED = [/^literata-latin-400-normal\.[^.]+\.woff2$/, /^literata-latin-600-normal\.[^.]+\.woff2$/];

let found: string[] | null = null;

function fontFiles(): string[] {
  if (found) return found;
  try {
    const files = readdirSync(path.join(process.cwd(), '.next', 'static', 'media'));
    found = WANTED.flatMap((re) => files.filter((f) => re.test(f)).slice(0, 1)).map((f) => `/_next/static/media/${f}`);
  } catch {
    found = [];
  }
  return found;
}

export function PreloadReadingFont() {
  for (const href of fontFiles()) preload(href, { as: 'font', type: 'font/woff2', crossOrigin: 'anonymous' });
  return null;
}
