/**
 * Shared inputs for the hydraulics tests. The site numbers are the
 * common-practice field facts (common practice, no source: 4 ft of fall, 29 ft of lift,
 * a ½-inch pump on about 2 US gal/min); pipe dimensions come from the
 * engine's schedule tables (ASME B36.10M / ASTM D1785, from memory).
 */
import { resolvePipe, toSI, type NominalSize, type PipeSeries } from '@/lib/hydraulics';

export const ft = (x: number) => toSI(x, 'ft', 'length');
export const gpm = (x: number) => toSI(x, 'gal/min', 'flow');
export const mlPerMin = (x: number) => toSI(x, 'mL/min', 'flow');

/** 4 ft of fall and 29 ft of lift — common practice, no source. */
export const FALL = ft(4);
export const LIFT = ft(29);

/**
 * A drive pipe of `size` in `series`, one 20-ft stick long — the length PVC
 * pipe is sold in (common practice, no source); 20 ft is 5 × the 4-ft fall,
 * inside the cited 3–12 H and 150–1000 D ranges for ½" and 1¼".
 */
export function drivePipe(
  size: NominalSize,
  series: PipeSeries = 'pvc-sch40',
  fittings: { kind: 'elbow-90-threaded' }[] = [],
) {
  const p = resolvePipe(series, size);
  return {
    lengthM: ft(20),
    insideDiameterM: p.insideDiameterM,
    wallThicknessM: p.wallThicknessM,
    pressureRatingPa: p.pressureRatingPa,
    material: p.material,
    fittings,
  };
}

/** 100 ft of ½" or ¾" sch 40 PVC delivery line. */
export function deliveryLine(size: NominalSize = '1/2', lengthFt = 100) {
  const p = resolvePipe('pvc-sch40', size);
  return {
    lengthM: ft(lengthFt),
    insideDiameterM: p.insideDiameterM,
    material: p.material,
    pressureRatingPa: p.pressureRatingPa,
  };
}
