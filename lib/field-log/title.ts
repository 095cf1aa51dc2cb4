/**
 * A field log entry's title in the reader's units: "Hollin brook: 2 × 1 inch homemade pumps in
 * parallel, 4.92 ft fall, 54.5 ft lift". Entries store SI; the title is drawn per reader, never
 * stored in one system. For the field log pages, the compare page, profiles and search.
 */
import type { UnitSystem } from '@/lib/hydraulics';
import { formatQuantity } from '@/lib/calculators/format';

export interface TitledEntry {
  siteName: string;
  pumpType: string;
  pumpSize: string;
  pumpCount: number;
  arrangement: string;
  fallM: number;
  liftM: number;
}

const ARRANGEMENT_WORDS: Record<string, string> = { single: '', parallel: ' in parallel', staged: ' in stages' };

/** The pumps in words: "1 inch homemade pump", "2 × 1 inch homemade pumps in parallel". */
export function entryPumps(e: Omit<TitledEntry, 'siteName' | 'fallM' | 'liftM'>): string {
  const many = e.pumpCount > 1;
  return `${many ? `${e.pumpCount} × ` : ''}${e.pumpSize} inch ${e.pumpType} pump${many ? 's' : ''}${ARRANGEMENT_WORDS[e.arrangement] ?? ''}`;
}

/** Fall and lift in the reader's units: "4.92 ft fall, 54.5 ft lift". */
export function entryHeads(e: Pick<TitledEntry, 'fallM' | 'liftM'>, units: UnitSystem): string {
  return `${formatQuantity('length', e.fallM, units)} fall, ${formatQuantity('length', e.liftM, units)} lift`;
}

export function entryTitle(e: TitledEntry, units: UnitSystem): string {
  return `${e.siteName}: ${entryPumps(e)}, ${entryHeads(e, units)}`;
}
