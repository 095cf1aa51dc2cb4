import type { ReactNode } from 'react';
import type { UnitPreference } from '@/lib/units/preference';

/**
 * A guide is built once for every reader, so it carries both systems and CSS shows the
 * reader's one: `<html data-units>` is set from the cw_units cookie before paint (the
 * script in app/layout.tsx) and hides the other system with display:none, which also
 * keeps it out of innerText and away from screen readers (app/globals.css).
 */

/** One quantity written the way each system's reader writes it: `<U us="12.6 psi" metric="87 kPa" />`. */
export function U({ us, metric }: { us: string; metric: string }) {
  return (
    <>
      <span data-units-only="US">{us}</span>
      <span data-units-only="metric">{metric}</span>
    </>
  );
}

/** A passage (a worked example, its formulas) written out for one system only. */
export function ForUnits({ system, children }: { system: string; children?: ReactNode }) {
  const s: UnitPreference | null = system === 'US' || system === 'metric' ? system : null;
  // props arrive as strings from MDX; a misspelt system would silently show to nobody
  if (!s) throw new Error(`<ForUnits system="${system}">: system must be "US" or "metric"`);
  return <div data-units-only={s}>{children}</div>;
}
