/**
 * A field log entry as a question's site sheet (the stall check's form, as typed),
 * so the ask form can be filled from a measured test.
 */
import { defaultSeries, type PipeMaterial } from '@/lib/hydraulics';
import type { SiteSheetField } from '@/lib/validation/question';
import type { EntryView } from './store';

const short = (x: number) => String(Number(x.toPrecision(4)));

export function entrySiteSheet(e: EntryView): Partial<Record<SiteSheetField, string>> {
  const sheet: Partial<Record<SiteSheetField, string>> = {
    fall: `${short(e.fallM)} m`,
    lift: `${short(e.liftM)} m`,
    driveLength: `${short(e.driveLengthM)} m`,
    driveSize: e.driveSize,
    driveMaterial: defaultSeries(e.driveMaterial as PipeMaterial),
    pumpSize: e.pumpSize,
    pumps: String(e.pumpCount),
    // the site sheet asks for one pump's drive flow
    driveFlow: `${short((e.driveFlowM3s / e.pumpCount) * 60_000)} L/min`,
    delivered: `${short(e.deliveredFlowM3s * 60_000)} L/min`,
  };
  if (e.beatsPerMinute !== null) sheet.bpm = String(e.beatsPerMinute);
  if (e.deliveryLengthM !== null) sheet.deliveryLength = `${short(e.deliveryLengthM)} m`;
  if (e.deliverySize) sheet.deliverySize = e.deliverySize;
  if (e.deliveryMaterial) sheet.deliveryMaterial = defaultSeries(e.deliveryMaterial as PipeMaterial);
  return sheet;
}
