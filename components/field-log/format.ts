import { NOMINAL_LABELS, type NominalSize } from '@/lib/hydraulics';

/** Litres per minute from m³/s, for tables and captions. */
export const lmin = (m3s: number) => (m3s * 60_000).toFixed(m3s * 60_000 >= 10 ? 1 : 2);
export const metres = (m: number) => m.toFixed(m >= 10 ? 1 : 2);
export const size = (s: string | null) => (s ? (NOMINAL_LABELS[s as NominalSize] ?? s) : '—');
export const MATERIAL_LABELS: Record<string, string> = { pvc: 'PVC', hdpe: 'HDPE (poly)', 'galvanized-steel': 'galvanized steel', steel: 'steel', hose: 'hose' };
export const material = (m: string | null) => (m ? (MATERIAL_LABELS[m] ?? m) : '—');
export const pumpsWords = (count: number, arrangement: string, pumpSize: string) =>
  count === 1 ? `one ${size(pumpSize)} pump` : `${count} × ${size(pumpSize)} pumps, ${arrangement}`;
