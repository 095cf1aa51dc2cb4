import { z } from 'zod';
import { PUMP_TYPES, type PipeMaterial } from '@/lib/vocabulary';
import { calendarDate } from './text';

/**
 * Shared by the field log form, POST /api/field-log and the CSV import. Lengths and
 * flows are typed with their unit ("4 ft", "1.2 m", "8 gal/min"), as on the ask form's
 * site sheet; the server reads them with the engine and refuses impossible values
 * naming the field.
 */
const quantity = (name: string) =>
  z
    .string({ error: `${name} is required` })
    .trim()
    .min(1, `${name} is required`)
    .max(40, `${name} must be at most 40 characters`);

// The order the form offers them in, most common first.
export const PIPE_MATERIAL_CHOICES = [
  'pvc',
  'hdpe',
  'galvanized-steel',
  'steel',
  'hose',
] as const satisfies readonly PipeMaterial[];
export const ARRANGEMENTS = ['single', 'parallel', 'staged'] as const;
export const DRIVE_FLOW_METHODS = ['measured', 'estimated'] as const;

export const trialSchema = z.object({
  volume: quantity('volume'),
  seconds: z
    .number({ error: 'seconds must be a number' })
    .positive('seconds must be more than 0')
    .max(3600, 'seconds must be at most 3600'),
});

export const fieldLogEntrySchema = z.object({
  /** the member's own saved site this test is on (its address); checked against the owner on save */
  siteId: z
    .string({ error: 'siteId must be a site address' })
    .trim()
    .regex(/^[0-9A-Za-z]{6,16}$/, 'siteId must be a site address')
    .optional(),
  siteName: z
    .string({ error: 'siteName is required' })
    .trim()
    .min(2, 'siteName must be at least 2 characters')
    .max(80, 'siteName must be at most 80 characters'),
  testedOn: calendarDate('testedOn'),
  pumpType: z.enum(PUMP_TYPES, { error: 'pumpType must be homemade or commercial' }).default('homemade'),
  pumpSize: z.string({ error: 'pumpSize is required' }).trim().min(1, 'pumpSize is required').max(12),
  pumpCount: z
    .number({ error: 'pumpCount must be a number' })
    .int('pumpCount must be a whole number')
    .min(1, 'pumpCount must be at least 1')
    .max(20, 'pumpCount must be at most 20')
    .default(1),
  arrangement: z.enum(ARRANGEMENTS, { error: 'arrangement must be single, parallel or staged' }).default('single'),
  fall: quantity('fall'),
  lift: quantity('lift'),
  driveLength: quantity('driveLength'),
  driveSize: z.string({ error: 'driveSize is required' }).trim().min(1, 'driveSize is required').max(12),
  driveMaterial: z.enum(PIPE_MATERIAL_CHOICES, {
    error: `driveMaterial must be one of ${PIPE_MATERIAL_CHOICES.join(', ')}`,
  }),
  deliveryLength: z.string().trim().max(40).optional(),
  deliverySize: z.string().trim().max(12).optional(),
  deliveryMaterial: z
    .enum(PIPE_MATERIAL_CHOICES, { error: `deliveryMaterial must be one of ${PIPE_MATERIAL_CHOICES.join(', ')}` })
    .optional(),
  driveFlow: quantity('driveFlow'),
  driveFlowMethod: z.enum(DRIVE_FLOW_METHODS, { error: 'driveFlowMethod must be measured or estimated' }),
  driveFlowHow: z.string().trim().max(300, 'driveFlowHow must be at most 300 characters').default(''),
  trials: z
    .array(trialSchema, { error: 'trials must be a list' })
    .min(1, 'trials: record at least one bucket trial')
    .max(20, 'trials: at most 20'),
  bpm: z
    .number({ error: 'bpm must be a number' })
    .positive('bpm must be more than 0')
    .max(400, 'bpm must be at most 400')
    .optional(),
  wasteValveSetting: z.string().trim().max(200, 'wasteValveSetting must be at most 200 characters').default(''),
  waterTempC: z
    .number({ error: 'waterTempC must be a number' })
    .min(0, 'waterTempC must be at least 0')
    .max(40, 'waterTempC must be at most 40')
    .optional(),
  notes: z.string().trim().max(5000, 'notes must be at most 5,000 characters').default(''),
  photoIds: z
    .array(z.string().regex(/^[0-9A-Za-z]{10,24}$/, 'photoIds must be ids from the upload'))
    .max(6, 'at most six photos')
    .default([]),
});
export type FieldLogEntryInput = z.input<typeof fieldLogEntrySchema>;
export type FieldLogEntryData = z.output<typeof fieldLogEntrySchema>;

export const fieldLogLinkSchema = z.object({
  beforeId: z.number({ error: 'beforeId must be a number' }).int().positive(),
  whatChanged: z
    .string({ error: 'whatChanged is required' })
    .trim()
    .min(3, 'whatChanged must be at least 3 characters')
    .max(300, 'whatChanged must be at most 300 characters'),
});

export const FIELD_LOG_SORTS = ['testedOn', 'efficiency', 'liftRatio', 'delivered', 'site'] as const;

export const fieldLogFilterSchema = z.object({
  pumpSize: z.string().max(12).optional(),
  material: z.enum(PIPE_MATERIAL_CHOICES).optional(),
  sort: z.enum(FIELD_LOG_SORTS).default('testedOn'),
  dir: z.enum(['asc', 'desc']).default('desc'),
  page: z.coerce.number().int().min(1).max(10_000).default(1),
  perPage: z.coerce.number().int().min(1).max(100).default(20),
});
export type FieldLogFilter = z.output<typeof fieldLogFilterSchema>;

export const importModeSchema = z.enum(['all-or-nothing', 'valid-only']).default('all-or-nothing');
