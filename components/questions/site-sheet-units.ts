/**
 * Units in the asker's site sheet: a box holding a bare number is read in the reader's units
 * (and the form says so and offers to write the unit in), and the stall check answers in the
 * units the asker typed.
 */
import { inputUnit, unitSystemOf, type QuantityKind, type UnitSystem } from '@/lib/hydraulics';
import { CALCULATORS } from '@/lib/calculators';
import { splitTyped } from '@/lib/calculators/state';

/** The kind of quantity a site-sheet box holds, or undefined for counts, sizes and choices. */
export function quantityKindOf(prop: string): QuantityKind | undefined {
  const f = CALCULATORS['stall-check'].fields.find((x) => x.prop === prop);
  return f?.type === 'quantity' ? f.qty : undefined;
}

const BARE = /^\s*(?:\d+(?:\.\d*)?|\.\d+)\s*$/;

/**
 * The unit a bare number in this box will be read in (the reader's), or undefined when the box
 * is empty, carries its own unit or holds no quantity.
 * @example bareNumberUnit('driveLength', '20', 'US') → 'ft'; bareNumberUnit('fall', '5 ft', 'US') → undefined
 */
export function bareNumberUnit(prop: string, value: string | undefined, units: UnitSystem): string | undefined {
  const kind = quantityKindOf(prop);
  return kind && value && BARE.test(value) ? inputUnit(kind, units) : undefined;
}

/** The sheet with every bare number written with the unit it is read in: what is posted and checked. */
export function withReaderUnits(sheet: Record<string, string>, units: UnitSystem): Record<string, string> {
  return Object.fromEntries(
    Object.entries(sheet).map(([k, v]) => {
      const unit = bareNumberUnit(k, v, units);
      return [k, unit ? `${v.trim()} ${unit}` : v];
    }),
  );
}

/**
 * The units the asker typed in: the system most of the site sheet's own units belong to, or
 * the reader's when the sheet gives none (or as many of each).
 */
export function typedUnits(sheet: Record<string, string | undefined>, readerUnits: UnitSystem): UnitSystem {
  let us = 0;
  let metric = 0;
  for (const [k, v] of Object.entries(sheet)) {
    if (!v || !quantityKindOf(k)) continue;
    const unit = splitTyped(v).unit;
    const system = unit ? unitSystemOf(unit) : undefined;
    if (system === 'US') us += 1;
    else if (system === 'metric') metric += 1;
  }
  return us > metric ? 'US' : metric > us ? 'metric' : readerUnits;
}
