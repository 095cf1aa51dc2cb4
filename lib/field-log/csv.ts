/**
 * CSV exchange for the field log (papaparse). Our own column set, units in the
 * header names, one installation test a row; trials as `;`-separated lists.
 * Import is all-or-nothing unless the caller asks for the valid rows only.
 */
import type { Actor } from '@/lib/auth/policy';
import Papa from 'papaparse';
import { getSequelize } from '@/lib/db';
import { ForumError } from '@/lib/questions/errors';
import { fieldLogEntrySchema, type FieldLogEntryData } from '@/lib/validation/field-log';
import { readEntry } from './measure';
import { createEntry, type EntryView } from './store';

/** The columns, in order, with what each holds. Shown on the import page and in the README. */
export const CSV_COLUMNS = [
  ['site_name', 'the site, as you name it (entries with the same name can be compared)', true],
  ['tested_on', 'date of the test, YYYY-MM-DD', true],
  ['pump_type', 'homemade or commercial', true],
  ['pump_size_in', 'nominal pump (drive) size in inches: 1/2, 3/4, 1, 1-1/4, 1-1/2, 2, 2-1/2, 3, 4', true],
  ['pump_count', 'number of pumps', true],
  ['arrangement', 'single, parallel or staged', true],
  ['fall_m', 'fall from the intake water surface to the pump, metres', true],
  ['lift_m', 'lift from the pump to the delivery outlet, metres', true],
  ['drive_length_m', 'drive pipe length, metres', true],
  ['drive_size_in', 'drive pipe nominal size, inches', true],
  ['drive_material', 'pvc, hdpe, galvanized-steel, steel or hose', true],
  ['delivery_length_m', 'delivery line length, metres (may be empty)', false],
  ['delivery_size_in', 'delivery line nominal size, inches (may be empty)', false],
  ['delivery_material', 'delivery line material (may be empty)', false],
  ['drive_flow_l_min', 'drive flow through all pumps, litres per minute', true],
  ['drive_flow_method', 'measured or estimated', true],
  ['drive_flow_how', 'how the drive flow was found (may be empty)', false],
  ['trial_volumes_l', 'volume of each bucket trial, litres, separated by ;', true],
  ['trial_seconds', 'seconds of each bucket trial, separated by ;, in the same order', true],
  ['beats_per_min', 'beats per minute (may be empty)', false],
  ['waste_valve_setting', 'waste valve setting in words (may be empty)', false],
  ['water_temp_c', 'water temperature, °C (may be empty)', false],
  ['notes', 'notes (may be empty)', false],
] as const;

/** Computed on export for reading; import ignores them. */
export const CSV_COMPUTED_COLUMNS = [
  'delivered_flow_l_min',
  'efficiency_daubuisson',
  'efficiency_rankine',
  'predicted_flow_l_min',
  'lift_ratio',
] as const;

type Column = (typeof CSV_COLUMNS)[number][0];
const COLUMN_NAMES: readonly string[] = CSV_COLUMNS.map((c) => c[0]);
export const MAX_IMPORT_ROWS = 2000;

/** Row numbers count the header as line 1, as a spreadsheet shows them. */
export interface RowError {
  line: number;
  column: Column | '(row)';
  message: string;
}

const FIELD_TO_COLUMN: Record<string, Column> = {
  siteName: 'site_name',
  testedOn: 'tested_on',
  pumpType: 'pump_type',
  pumpSize: 'pump_size_in',
  pumpCount: 'pump_count',
  arrangement: 'arrangement',
  fall: 'fall_m',
  lift: 'lift_m',
  driveLength: 'drive_length_m',
  driveSize: 'drive_size_in',
  driveMaterial: 'drive_material',
  deliveryLength: 'delivery_length_m',
  deliverySize: 'delivery_size_in',
  deliveryMaterial: 'delivery_material',
  driveFlow: 'drive_flow_l_min',
  driveFlowMethod: 'drive_flow_method',
  driveFlowHow: 'drive_flow_how',
  bpm: 'beats_per_min',
  wasteValveSetting: 'waste_valve_setting',
  waterTempC: 'water_temp_c',
  notes: 'notes',
};

function columnOf(field: string | undefined): Column | '(row)' {
  if (!field) return '(row)';
  const [head = '', , sub] = field.split('.');
  if (head === 'trials') return sub === 'seconds' ? 'trial_seconds' : 'trial_volumes_l';
  return FIELD_TO_COLUMN[head] ?? '(row)';
}

const NUMBER = /^[+-]?(\d+\.?\d*|\.\d+)(e[+-]?\d+)?$/i;

/** A number cell, or an error message for it; empty gives undefined. */
function numberCell(raw: string, column: Column): number | undefined | { error: string } {
  const s = raw.trim();
  if (s === '') return undefined;
  if (!NUMBER.test(s)) return { error: `${column}: "${raw}" is not a number` };
  return Number(s);
}

function lengthCell(raw: string, unit: string): string | undefined {
  const s = raw.trim();
  return s === '' ? undefined : NUMBER.test(s) ? `${s} ${unit}` : s;
}

/** One CSV row into the entry form, or the first error naming its column. */
export function rowToInput(
  row: Record<string, string>,
  line: number,
): { data: FieldLogEntryData } | { error: RowError } {
  const cell = (c: Column) => (row[c] ?? '').trim();
  const fail = (column: Column | '(row)', message: string) => ({ error: { line, column, message } });
  const nums: Partial<Record<Column, number>> = {};
  for (const c of ['pump_count', 'beats_per_min', 'water_temp_c'] as const) {
    const n = numberCell(cell(c), c);
    if (typeof n === 'object') return fail(c, n.error);
    if (n !== undefined) nums[c] = n;
  }
  for (const c of ['fall_m', 'lift_m', 'drive_length_m', 'delivery_length_m', 'drive_flow_l_min'] as const) {
    if (cell(c) !== '' && !NUMBER.test(cell(c)))
      return fail(c, `${c}: "${cell(c)}" is not a number (the unit is in the column name)`);
  }
  const volumes =
    cell('trial_volumes_l') === ''
      ? []
      : cell('trial_volumes_l')
          .split(';')
          .map((s) => s.trim());
  const seconds =
    cell('trial_seconds') === ''
      ? []
      : cell('trial_seconds')
          .split(';')
          .map((s) => s.trim());
  if (volumes.length === 0) return fail('trial_volumes_l', 'trial_volumes_l: give at least one trial volume');
  if (volumes.length !== seconds.length)
    return fail(
      'trial_seconds',
      `trial_seconds: ${seconds.length} times for ${volumes.length} volumes; give one time for each volume`,
    );
  const trials = [];
  for (const [i, volume] of volumes.entries()) {
    const second = seconds[i] ?? ''; // as many as the volumes, checked above
    if (!NUMBER.test(volume))
      return fail('trial_volumes_l', `trial_volumes_l: "${volume}" (trial ${i + 1}) is not a number`);
    if (!NUMBER.test(second))
      return fail('trial_seconds', `trial_seconds: "${second}" (trial ${i + 1}) is not a number`);
    trials.push({ volume: `${volume} L`, seconds: Number(second) });
  }
  const input = {
    siteName: cell('site_name'),
    testedOn: cell('tested_on'),
    pumpType: cell('pump_type') || undefined,
    pumpSize: cell('pump_size_in'),
    pumpCount: nums.pump_count,
    arrangement: cell('arrangement') || undefined,
    fall: lengthCell(cell('fall_m'), 'm') ?? '',
    lift: lengthCell(cell('lift_m'), 'm') ?? '',
    driveLength: lengthCell(cell('drive_length_m'), 'm') ?? '',
    driveSize: cell('drive_size_in'),
    driveMaterial: cell('drive_material') || undefined,
    deliveryLength: lengthCell(cell('delivery_length_m'), 'm'),
    deliverySize: cell('delivery_size_in') || undefined,
    deliveryMaterial: cell('delivery_material') || undefined,
    driveFlow: lengthCell(cell('drive_flow_l_min'), 'L/min') ?? '',
    driveFlowMethod: cell('drive_flow_method') || undefined,
    driveFlowHow: cell('drive_flow_how'),
    trials,
    bpm: nums.beats_per_min,
    wasteValveSetting: cell('waste_valve_setting'),
    waterTempC: nums.water_temp_c,
    notes: cell('notes'),
  };
  const parsed = fieldLogEntrySchema.safeParse(input);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    const column = columnOf(issue?.path.join('.'));
    const message = issue?.message ?? 'this row could not be read';
    return fail(column, column === '(row)' ? message : `${column}: ${message.replace(/^\w+(\.\d+\.\w+)?:? /, '')}`);
  }
  try {
    readEntry(parsed.data);
  } catch (err) {
    if (err instanceof ForumError) {
      const column = columnOf(err.field);
      return fail(column, column === '(row)' ? err.message : `${column}: ${err.message.replace(/^[\w.]+: /, '')}`);
    }
    throw err;
  }
  return { data: parsed.data };
}

export interface ImportResult {
  imported: number;
  ids: number[];
  skipped: number;
  errors: RowError[];
}

/** Reads the file's rows; throws a ForumError for a file that is not our CSV at all. */
export function parseCsv(text: string): { rows: Record<string, string>[] } {
  const parsed = Papa.parse<Record<string, string>>(text.replace(/^\uFEFF/, ''), {
    header: true,
    skipEmptyLines: 'greedy',
    transformHeader: (h) => h.trim(),
  });
  const headers = parsed.meta.fields ?? [];
  const missing = CSV_COLUMNS.filter((c) => c[2] && !headers.includes(c[0])).map((c) => c[0]);
  if (missing.length)
    throw new ForumError(422, `file: the header lacks ${missing.join(', ')} (see the column list)`, 'file');
  const unknown = headers.filter(
    (h) => !COLUMN_NAMES.includes(h) && !(CSV_COMPUTED_COLUMNS as readonly string[]).includes(h),
  );
  if (unknown.length)
    throw new ForumError(422, `file: unknown columns ${unknown.join(', ')} (see the column list)`, 'file');
  const structural = parsed.errors.find((e) => e.type !== 'FieldMismatch' || e.code === 'TooManyFields');
  if (structural) throw new ForumError(422, `file: line ${(structural.row ?? 0) + 2}: ${structural.message}`, 'file');
  if (parsed.data.length === 0) throw new ForumError(422, 'file: no rows under the header', 'file');
  if (parsed.data.length > MAX_IMPORT_ROWS)
    throw new ForumError(422, `file: at most ${MAX_IMPORT_ROWS} rows at a time`, 'file');
  return { rows: parsed.data };
}

/**
 * Imports as the caller's own entries in one transaction. All-or-nothing: any bad row
 * and nothing is written (the errors come back). Valid-only: the good rows are written
 * and the bad ones listed as skipped.
 */
export async function importCsv(
  user: Actor,
  text: string,
  mode: 'all-or-nothing' | 'valid-only',
): Promise<ImportResult> {
  const { rows } = parseCsv(text);
  const errors: RowError[] = [];
  const good: FieldLogEntryData[] = [];
  rows.forEach((r, i) => {
    const out = rowToInput(r, i + 2);
    if ('error' in out) errors.push(out.error);
    else good.push(out.data);
  });
  if (mode === 'all-or-nothing' && errors.length) return { imported: 0, ids: [], skipped: rows.length, errors };
  const ids = await getSequelize().transaction(async (transaction) => {
    const out: number[] = [];
    for (const g of good) out.push((await createEntry(user, g, transaction)).id);
    return out;
  });
  return { imported: ids.length, ids, skipped: errors.length, errors };
}

const num = (x: number | null | undefined) => (x === null || x === undefined ? '' : String(Number(x.toPrecision(10))));
const lmin = (m3s: number) => num(m3s * 60_000);

const EXPORT_COLUMNS = [...COLUMN_NAMES, ...CSV_COMPUTED_COLUMNS];

function exportRow(e: EntryView): string[] {
  const r: Record<string, string> = {
    site_name: e.siteName,
    tested_on: e.testedOn,
    pump_type: e.pumpType,
    pump_size_in: e.pumpSize,
    pump_count: String(e.pumpCount),
    arrangement: e.arrangement,
    fall_m: num(e.fallM),
    lift_m: num(e.liftM),
    drive_length_m: num(e.driveLengthM),
    drive_size_in: e.driveSize,
    drive_material: e.driveMaterial,
    delivery_length_m: num(e.deliveryLengthM),
    delivery_size_in: e.deliverySize ?? '',
    delivery_material: e.deliveryMaterial ?? '',
    drive_flow_l_min: lmin(e.driveFlowM3s),
    drive_flow_method: e.driveFlowMethod,
    drive_flow_how: e.driveFlowHow,
    trial_volumes_l: e.trials.map((t) => num(t.volumeL)).join(';'),
    trial_seconds: e.trials.map((t) => num(t.seconds)).join(';'),
    beats_per_min: num(e.beatsPerMinute),
    waste_valve_setting: e.wasteValveSetting,
    water_temp_c: num(e.waterTempC),
    notes: e.notes,
    delivered_flow_l_min: lmin(e.deliveredFlowM3s),
    efficiency_daubuisson: num(e.performance.dAubuisson),
    efficiency_rankine: num(e.performance.rankine),
    predicted_flow_l_min: lmin(e.performance.predictedDeliveredFlowM3s),
    lift_ratio: num(e.performance.liftRatio),
  };
  return EXPORT_COLUMNS.map((c) => r[c] ?? '');
}

const UNPARSE = { newline: '\r\n', escapeFormulae: true } as const;

/** The export's header line, with its line break. */
export function exportCsvHeader(): string {
  return `${Papa.unparse([EXPORT_COLUMNS], UNPARSE)}\r\n`;
}

/** Export lines for some entries, each ending in a line break (streamed a chunk at a time). */
export function exportCsvRows(entries: EntryView[]): string {
  return entries.length ? `${Papa.unparse(entries.map(exportRow), UNPARSE)}\r\n` : '';
}

/** The entries as CSV, with our columns then the computed ones. */
export function exportCsv(entries: EntryView[]): string {
  return Papa.unparse({ fields: EXPORT_COLUMNS, data: entries.map(exportRow) }, UNPARSE);
}
