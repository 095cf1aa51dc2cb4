/**
 * Field log entries: record (one transaction with its trials), read with the engine's
 * view of it, list for the community chart and table, and link before/after.
 */
import { Op, type Transaction, type WhereOptions } from 'sequelize';
import { getSequelize } from '@/lib/db';
import { initModels } from '@/models';
import type { FieldLogEntry } from '@/models/FieldLogEntry';
import type { SessionUser } from '@/lib/auth/session';
import { can, type Actor } from '@/lib/auth/policy';
import { ForumError } from '@/lib/questions/errors';
import { parseNominalSize } from '@/lib/hydraulics';
import { attachPhotos } from '@/lib/photos/store';
import { SiteError, siteIdForLink } from '@/lib/sites/store';
import type { FieldLogEntryData, FieldLogFilter } from '@/lib/validation/field-log';
import { performance, readEntry, type EntryPerformance, type TrialSI } from './measure';
import { deliveryRatio, plannerRatio, type Ratio } from './compare';

/** The rows for one entry as typed: the entry (SI beside the typed values) and its trials. Throws a ForumError naming a bad field. */
export function entryRows(authorId: number, v: FieldLogEntryData) {
  const si = readEntry(v);
  const typed: Record<string, string> = {
    fall: v.fall,
    lift: v.lift,
    driveLength: v.driveLength,
    driveFlow: v.driveFlow,
    pumpSize: v.pumpSize,
    driveSize: v.driveSize,
    ...(v.deliveryLength ? { deliveryLength: v.deliveryLength } : {}),
    ...(v.deliverySize ? { deliverySize: v.deliverySize } : {}),
    trials: v.trials.map((x) => `${x.volume} in ${x.seconds} s`).join('; '),
  };
  const entry = {
    authorId,
    siteName: v.siteName,
    testedOn: v.testedOn,
    pumpType: v.pumpType,
    pumpSize: si.pumpSize,
    pumpCount: v.pumpCount,
    arrangement: v.arrangement,
    fallM: si.fallM,
    liftM: si.liftM,
    driveLengthM: si.driveLengthM,
    driveSize: si.driveSize,
    driveMaterial: v.driveMaterial,
    deliveryLengthM: si.deliveryLengthM,
    deliverySize: si.deliverySize,
    deliveryMaterial: v.deliveryMaterial ?? null,
    driveFlowM3s: si.driveFlowM3s,
    driveFlowMethod: v.driveFlowMethod,
    driveFlowHow: v.driveFlowHow,
    deliveredFlowM3s: si.deliveredFlowM3s,
    beatsPerMinute: v.bpm ?? null,
    wasteValveSetting: v.wasteValveSetting,
    waterTempC: v.waterTempC ?? null,
    notes: v.notes,
    typed,
  };
  return { entry, trials: si.trials.map((x, i) => ({ position: i, volumeL: x.volumeL, seconds: x.seconds })) };
}

/** The internal id of the member's own site a test is recorded on; a ForumError naming siteId otherwise. */
async function siteOfEntry(user: Actor, publicId: string | undefined, t: Transaction): Promise<number | null> {
  if (!publicId) return null;
  try {
    return await siteIdForLink(user, publicId, t);
  } catch (err) {
    if (err instanceof SiteError) throw new ForumError(err.status, `siteId: ${err.message}`, 'siteId');
    throw err;
  }
}

/** Writes one entry and its trials (and the site it is on, the member's own), in the given transaction or a new one. */
export async function createEntry(
  user: Actor,
  v: FieldLogEntryData,
  transaction?: Transaction,
): Promise<FieldLogEntry> {
  const rows = entryRows(user.id, v);
  const { FieldLogEntry, FieldLogTrial } = initModels();
  const work = async (t: Transaction) => {
    const siteId = await siteOfEntry(user, v.siteId, t);
    const e = await FieldLogEntry.create({ ...rows.entry, siteId }, { transaction: t });
    await FieldLogTrial.bulkCreate(
      rows.trials.map((x) => ({ ...x, entryId: e.id })),
      { transaction: t },
    );
    if (v.photoIds.length) {
      const n = await attachPhotos(v.photoIds, user.id, { fieldLogEntryId: e.id }, t);
      if (n !== new Set(v.photoIds).size)
        throw new ForumError(422, 'photoIds: a photo is not yours or is already attached', 'photoIds');
    }
    return e;
  };
  return transaction ? work(transaction) : getSequelize().transaction(work);
}

function visibleWhere(viewer: Actor | null): WhereOptions {
  return can(viewer, 'moderation.seeHidden') ? {} : { hiddenAt: null, deletedAt: null };
}

export interface EntryView {
  id: number;
  author: { handle: string; displayName: string };
  authorId: number;
  siteName: string;
  testedOn: string;
  pumpType: 'homemade' | 'commercial';
  pumpSize: string;
  pumpCount: number;
  arrangement: 'single' | 'parallel' | 'staged';
  fallM: number;
  liftM: number;
  driveLengthM: number;
  driveSize: string;
  driveMaterial: string;
  deliveryLengthM: number | null;
  deliverySize: string | null;
  deliveryMaterial: string | null;
  driveFlowM3s: number;
  driveFlowMethod: 'measured' | 'estimated';
  driveFlowHow: string;
  deliveredFlowM3s: number;
  beatsPerMinute: number | null;
  wasteValveSetting: string;
  waterTempC: number | null;
  notes: string;
  typed: Record<string, string>;
  trials: TrialSI[];
  hidden: boolean;
  deleted: boolean;
  performance: EntryPerformance;
}

function toView(e: FieldLogEntry): EntryView {
  const trials = [...(e.trials ?? [])]
    .sort((a, b) => a.position - b.position)
    .map((t) => ({ volumeL: t.volumeL, seconds: t.seconds }));
  return {
    id: e.id,
    authorId: e.authorId,
    author: { handle: e.author?.handle ?? '', displayName: e.author?.displayName ?? '' },
    siteName: e.siteName,
    testedOn: String(e.testedOn),
    pumpType: e.pumpType,
    pumpSize: e.pumpSize,
    pumpCount: e.pumpCount,
    arrangement: e.arrangement,
    fallM: e.fallM,
    liftM: e.liftM,
    driveLengthM: e.driveLengthM,
    driveSize: e.driveSize,
    driveMaterial: e.driveMaterial,
    deliveryLengthM: e.deliveryLengthM,
    deliverySize: e.deliverySize,
    deliveryMaterial: e.deliveryMaterial,
    driveFlowM3s: e.driveFlowM3s,
    driveFlowMethod: e.driveFlowMethod,
    driveFlowHow: e.driveFlowHow,
    deliveredFlowM3s: e.deliveredFlowM3s,
    beatsPerMinute: e.beatsPerMinute,
    wasteValveSetting: e.wasteValveSetting,
    waterTempC: e.waterTempC,
    notes: e.notes,
    typed: e.typed,
    trials,
    hidden: e.hiddenAt !== null && e.hiddenAt !== undefined,
    deleted: e.deletedAt !== null && e.deletedAt !== undefined,
    performance: performance({
      pumpType: e.pumpType,
      fallM: e.fallM,
      liftM: e.liftM,
      driveFlowM3s: e.driveFlowM3s,
      waterTempC: e.waterTempC,
      trials,
    }),
  };
}

const include = [{ association: 'author', attributes: ['handle', 'displayName'] }, { association: 'trials' }];

/** One entry as the viewer may see it, or null (hidden and deleted entries only for moderators). */
export async function getEntry(id: number, viewer: Actor | null): Promise<EntryView | null> {
  const { FieldLogEntry } = initModels();
  const e = await FieldLogEntry.findOne({ where: { id, ...visibleWhere(viewer) }, include });
  return e ? toView(e) : null;
}

/** The visible entries recorded on a site (by its internal id), as views, oldest test first. */
export async function entriesOnSite(siteId: number, viewer: Actor | null): Promise<EntryView[]> {
  const { FieldLogEntry } = initModels();
  const rows = await FieldLogEntry.findAll({
    where: { siteId, ...visibleWhere(viewer) },
    include,
    order: [
      ['testedOn', 'ASC'],
      ['id', 'ASC'],
    ],
    limit: 500,
  });
  return rows.map(toView);
}

/** Every visible entry matching the filter, as views (the chart needs them all; the table pages them). */
export async function filteredEntries(
  filter: Pick<FieldLogFilter, 'pumpSize' | 'material'>,
  viewer: Actor | null,
): Promise<EntryView[]> {
  const { FieldLogEntry } = initModels();
  const where: Record<string, unknown> = { ...visibleWhere(viewer) };
  if (filter.pumpSize) {
    const n = parseNominalSize(filter.pumpSize);
    if (!n) throw new ForumError(400, `pumpSize: "${filter.pumpSize}" is not a pipe size from ½" to 4"`, 'pumpSize');
    where.pumpSize = n;
  }
  if (filter.material) where.driveMaterial = filter.material;
  const rows = await FieldLogEntry.findAll({
    where,
    include,
    order: [
      ['testedOn', 'DESC'],
      ['id', 'DESC'],
    ],
  });
  return rows.map(toView);
}

/** The visible entries with these ids, as views, in the order of `ids` (the export reads them a chunk at a time). */
export async function entryViewsByIds(ids: number[], viewer: Actor | null): Promise<EntryView[]> {
  if (ids.length === 0) return [];
  const { FieldLogEntry } = initModels();
  const rows = await FieldLogEntry.findAll({ where: { id: ids, ...visibleWhere(viewer) }, include });
  const byId = new Map(rows.map((r) => [r.id, toView(r)]));
  return ids.flatMap((id) => byId.get(id) ?? []);
}

/**
 * The ids of every visible entry matching the filter, in the view's order. Stored
 * columns sort in one light query (no trials); the computed orders (efficiency, lift
 * ratio) need each entry's working, read a chunk at a time and kept only as keys.
 */
export async function filteredIdsInOrder(
  filter: Pick<FieldLogFilter, 'pumpSize' | 'material' | 'sort' | 'dir'>,
  viewer: Actor | null,
  chunk: (ids: number[]) => Promise<EntryView[]>,
  gate: <T>(work: () => Promise<T>) => Promise<T> = (work) => work(),
): Promise<number[]> {
  const { FieldLogEntry } = initModels();
  const where: Record<string, unknown> = { ...visibleWhere(viewer) };
  if (filter.pumpSize) {
    const n = parseNominalSize(filter.pumpSize);
    if (!n) throw new ForumError(400, `pumpSize: "${filter.pumpSize}" is not a pipe size from ½" to 4"`, 'pumpSize');
    where.pumpSize = n;
  }
  if (filter.material) where.driveMaterial = filter.material;
  const light = await gate(() =>
    FieldLogEntry.findAll({ where, attributes: ['id', 'testedOn', 'siteName', 'deliveredFlowM3s'], raw: true }),
  );
  let keyed: { id: number; key: number | string }[];
  if (filter.sort === 'efficiency' || filter.sort === 'liftRatio') {
    keyed = [];
    for (let i = 0; i < light.length; i += EXPORT_CHUNK) {
      for (const v of await chunk(light.slice(i, i + EXPORT_CHUNK).map((r) => r.id)))
        keyed.push({ id: v.id, key: SORT_KEY[filter.sort](v) });
    }
  } else {
    const key = SORT_KEY[filter.sort];
    keyed = light.map((r) => ({ id: r.id, key: key({ ...r, testedOn: String(r.testedOn) } as unknown as EntryView) }));
  }
  keyed.sort((a, b) => {
    const c = a.key < b.key ? -1 : a.key > b.key ? 1 : a.id - b.id;
    return filter.dir === 'asc' ? c : -c;
  });
  return keyed.map((k) => k.id);
}

/** Entries read per query by the export. */
export const EXPORT_CHUNK = 200;

const SORT_KEY: Record<FieldLogFilter['sort'], (e: EntryView) => number | string> = {
  testedOn: (e) => `${e.testedOn}|${String(e.id).padStart(10, '0')}`,
  efficiency: (e) => e.performance.dAubuisson,
  liftRatio: (e) => e.performance.liftRatio,
  delivered: (e) => e.deliveredFlowM3s,
  site: (e) => e.siteName.toLowerCase(),
};

/** Sorts and pages views; efficiency and lift ratio are computed, so sorting happens here rather than in SQL. */
export function sortAndPage(entries: EntryView[], f: Pick<FieldLogFilter, 'sort' | 'dir' | 'page' | 'perPage'>) {
  const key = SORT_KEY[f.sort];
  const sorted = [...entries].sort((a, b) => {
    const x = key(a);
    const y = key(b);
    const c = x < y ? -1 : x > y ? 1 : a.id - b.id;
    return f.dir === 'asc' ? c : -c;
  });
  const start = (f.page - 1) * f.perPage;
  return {
    total: entries.length,
    page: f.page,
    perPage: f.perPage,
    totalPages: Math.max(1, Math.ceil(entries.length / f.perPage)),
    items: sorted.slice(start, start + f.perPage),
  };
}

export interface Comparison {
  before: EntryView;
  after: EntryView;
  whatChanged: string;
  measured: Ratio;
  planner: { ratio: number; beforeM3s: number; afterM3s: number } | null;
}

/** The before/after pair, when linked and both visible to the viewer. */
export async function getComparison(
  beforeId: number,
  afterId: number,
  viewer: Actor | null,
): Promise<Comparison | null> {
  const { FieldLogLink } = initModels();
  const link = await FieldLogLink.findOne({ where: { beforeId, afterId } });
  if (!link) return null;
  const [before, after] = await Promise.all([getEntry(beforeId, viewer), getEntry(afterId, viewer)]);
  if (!before || !after) return null;
  return {
    before,
    after,
    whatChanged: link.whatChanged,
    measured: deliveryRatio(before.trials, after.trials),
    planner: plannerRatio(before, after),
  };
}

/** Links for an entry, in both directions. */
export async function linksOf(id: number) {
  const { FieldLogLink } = initModels();
  const rows = await FieldLogLink.findAll({
    where: { [Op.or]: [{ beforeId: id }, { afterId: id }] },
    order: [['id', 'ASC']],
  });
  return rows.map((r) => ({ beforeId: r.beforeId, afterId: r.afterId, whatChanged: r.whatChanged }));
}

/**
 * Links `afterId` as the after of `beforeId`. Both must be on the same site (same
 * site name, same author) and the after must be the caller's own (or a moderator's act).
 */
export async function linkEntries(
  user: SessionUser,
  afterId: number,
  input: { beforeId: number; whatChanged: string },
) {
  const { FieldLogEntry, FieldLogLink } = initModels();
  return getSequelize().transaction(async (transaction) => {
    const after = await FieldLogEntry.findOne({
      where: { id: afterId, deletedAt: null },
      transaction,
      lock: transaction.LOCK.UPDATE,
    });
    if (!after) throw new ForumError(404, 'no such field log entry', 'id');
    if (!can(user, 'fieldLog.edit', after.authorId)) throw new ForumError(403, 'Only its author can link this entry.');
    if (input.beforeId === afterId)
      throw new ForumError(422, 'beforeId: an entry cannot be its own before', 'beforeId');
    const before = await FieldLogEntry.findOne({ where: { id: input.beforeId, deletedAt: null }, transaction });
    if (!before) throw new ForumError(422, 'beforeId: no such field log entry', 'beforeId');
    if (
      before.authorId !== after.authorId ||
      before.siteName.trim().toLowerCase() !== after.siteName.trim().toLowerCase()
    ) {
      throw new ForumError(
        422,
        'beforeId: before and after must be entries on the same site (same site name, same author)',
        'beforeId',
      );
    }
    const existing = await FieldLogLink.findOne({ where: { beforeId: input.beforeId, afterId }, transaction });
    if (existing) throw new ForumError(409, 'beforeId: these entries are already linked', 'beforeId');
    return FieldLogLink.create(
      { beforeId: input.beforeId, afterId, whatChanged: input.whatChanged, createdBy: user.id },
      { transaction },
    );
  });
}
