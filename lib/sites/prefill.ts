import { asWritten, type QuantityKind, type UnitSystem } from '@/lib/hydraulics';
import type { PlanLayout } from './measured';

const typed = (kind: QuantityKind, si: number, units: UnitSystem) => {
  const w = asWritten(kind, si, units);
  return `${w.value} ${w.unit}`;
};

/**
 * A field log form filled from a site's plan, so the member adds only what they
 * measured: the installation as planned, each length as a tape in the reader's units
 * gives it. The plan's fall and lift are the survey's; the member corrects them to the
 * day's if the stream stands higher or lower.
 */
export function entryPrefill(siteName: string, layout: PlanLayout | null, units: UnitSystem): Record<string, string> {
  if (!layout) return { siteName };
  return {
    siteName,
    pumpType: layout.pumpType,
    pumpSize: layout.pumpSize,
    pumpCount: String(layout.pumpCount),
    arrangement: layout.arrangement,
    fall: typed('length', layout.fallM, units),
    lift: typed('length', layout.liftM, units),
    driveLength: typed('length', layout.drivePipe.lengthM, units),
    driveSize: layout.driveSize,
    driveMaterial: layout.drivePipe.material,
    deliveryLength: typed('length', layout.deliveryLine.lengthM, units),
    deliverySize: layout.deliverySize,
    deliveryMaterial: layout.deliveryLine.material,
  };
}
