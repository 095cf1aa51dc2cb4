import { palette } from '@/tailwind.config';

/** A palette colour by its class name part ("clay-700", "signal"), as hex. */
function colour(name: string): string {
  const [hue, shade = 'DEFAULT'] = name.split('-');
  const c = (palette as unknown as Record<string, Record<string, string>>)[hue!]?.[shade];
  if (!c) throw new Error(`no colour ${name}`);
  return c;
}

/** The text and background colours a class list sets, in the light or the dark theme. */
export function textOnBackground(classes: string, dark: boolean): [string, string] {
  const prefix = dark ? 'dark:' : '';
  const pick = (kind: 'text' | 'bg') => {
    const m = classes.split(/\s+/).find((c) => c.startsWith(`${prefix}${kind}-`) && (dark || !c.includes(':')));
    if (!m) throw new Error(`no ${prefix}${kind} in ${classes}`);
    return colour(m.slice(prefix.length + kind.length + 1));
  };
  return [pick('text'), pick('bg')];
}
