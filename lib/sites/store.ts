import 'server-only';
import type { Transaction } from 'sequelize';
import { getSequelize } from '@/lib/db';
import { initModels } from '@/models';
import type { Site } from '@/models/Site';
import type { SiteVersion } from '@/models/SiteVersion';
import { can, REFUSAL, type Actor } from '@/lib/auth/policy';
import { newPublicId } from '@/lib/calculations/store';
import type { SiteVisibility } from '@/lib/vocabulary';

/** A refusal or a missing site, with the HTTP status and the field it concerns. */
export class SiteError extends Error {
  constructor(
    readonly status: number,
    message: string,
    readonly field?: string,
  ) {
    super(message);
  }
}

/** One saved survey and the plan made of it. */
export interface SiteSurvey {
  /** the survey as typed, each value with its unit */
  survey: Record<string, string>;
  /** what the engine made of it */
  plan: Record<string, unknown>;
  engineVersion: string;
}

export interface SiteView {
  id: string;
  name: string;
  visibility: SiteVisibility;
  owner: { handle: string; displayName: string };
  mine: boolean;
  versions: { version: number; createdAt: string; engineVersion: string }[];
  /** the version asked for (the newest unless one is named) */
  current: SiteSurvey & { version: number; createdAt: string };
}

/**
 * Who may see a site, through the policy table: a private site its owner only (anyone
 * else is told it does not exist, so a private site's address gives nothing away), a
 * shared or public one anyone.
 */
export function maySee(actor: Actor | null, site: Pick<Site, 'ownerId' | 'visibility'>): boolean {
  return site.visibility === 'private'
    ? can(actor, 'site.readPrivate', site.ownerId)
    : can(actor, 'site.readShared', site.ownerId);
}

/** A new site with its first version, in one transaction. */
export async function createSite(
  owner: Actor,
  input: { name: string } & SiteSurvey,
  transaction?: Transaction,
): Promise<Site> {
  if (!can(owner, 'site.save')) throw new SiteError(403, REFUSAL['site.save']);
  const { Site, SiteVersion } = initModels();
  const work = async (t: Transaction) => {
    const site = await Site.create(
      { publicId: newPublicId(), ownerId: owner.id, name: input.name },
      { transaction: t },
    );
    await SiteVersion.create({ siteId: site.id, version: 1, ...surveyOf(input) }, { transaction: t });
    return site;
  };
  // the caller's transaction when it keeps an idempotency key with the site
  return transaction ? work(transaction) : getSequelize().transaction(work);
}

function surveyOf(s: SiteSurvey) {
  return { survey: s.survey, plan: s.plan, engineVersion: s.engineVersion };
}

/** The owner's site by its address, locked for a change; refused to anyone else. */
async function ownSite(actor: Actor, publicId: string, transaction: Transaction): Promise<Site> {
  const { Site } = initModels();
  const site = await Site.findOne({ where: { publicId }, transaction, lock: transaction.LOCK.UPDATE });
  if (!site || !maySee(actor, site)) throw new SiteError(404, 'No such site.', 'id');
  if (!can(actor, 'site.edit', site.ownerId)) throw new SiteError(403, REFUSAL['site.edit']);
  return site;
}

/** A changed survey: a new version after the newest; the older ones stay as they were. */
export async function addSiteVersion(
  actor: Actor,
  publicId: string,
  input: SiteSurvey,
  outer?: Transaction,
): Promise<number> {
  const { SiteVersion } = initModels();
  const work = async (transaction: Transaction) => {
    const site = await ownSite(actor, publicId, transaction);
    // the row lock on the site serialises two saves at once, so versions never collide
    const newest = ((await SiteVersion.max('version', { where: { siteId: site.id }, transaction })) as number) ?? 0;
    await SiteVersion.create({ siteId: site.id, version: newest + 1, ...surveyOf(input) }, { transaction });
    site.changed('updatedAt', true);
    await site.save({ transaction });
    return newest + 1;
  };
  return outer ? work(outer) : getSequelize().transaction(work);
}

/** The owner renames a site or changes who may see it. */
export async function updateSite(
  actor: Actor,
  publicId: string,
  change: { name?: string; visibility?: SiteVisibility },
): Promise<void> {
  await getSequelize().transaction(async (transaction) => {
    const site = await ownSite(actor, publicId, transaction);
    if (change.name !== undefined) site.name = change.name;
    if (change.visibility !== undefined) site.visibility = change.visibility;
    await site.save({ transaction });
  });
}

/** A site as the actor may see it, at one version (the newest by default); 404 when they may not. */
export async function loadSite(actor: Actor | null, publicId: string, version?: number): Promise<SiteView> {
  const { Site, SiteVersion, User } = initModels();
  const site = /^[0-9A-Za-z]{6,16}$/.test(publicId)
    ? await Site.findOne({
        where: { publicId },
        include: [{ model: User, as: 'owner', attributes: ['handle', 'displayName'] }],
      })
    : null;
  if (!site || !maySee(actor, site)) throw new SiteError(404, 'No such site.', 'id');
  const versions = await SiteVersion.findAll({
    where: { siteId: site.id },
    attributes: ['version', 'createdAt', 'engineVersion'],
    order: [['version', 'ASC']],
  });
  const wanted = version ?? versions[versions.length - 1]?.version;
  const current = wanted ? await SiteVersion.findOne({ where: { siteId: site.id, version: wanted } }) : null;
  if (!current) throw new SiteError(404, `This site has no version ${version}.`, 'version');
  return {
    id: site.publicId,
    name: site.name,
    visibility: site.visibility,
    owner: { handle: site.owner!.handle, displayName: site.owner!.displayName },
    mine: actor?.id === site.ownerId,
    versions: versions.map((v) => ({
      version: v.version,
      createdAt: v.createdAt.toISOString(),
      engineVersion: v.engineVersion,
    })),
    current: { ...surveyOfVersion(current), version: current.version, createdAt: current.createdAt.toISOString() },
  };
}

function surveyOfVersion(v: SiteVersion): SiteSurvey {
  return { survey: v.survey, plan: v.plan, engineVersion: v.engineVersion };
}

/** The actor's own sites, newest change first; or another member's public ones. */
export async function listSites(actor: Actor | null, ownerId: number) {
  const { Site } = initModels();
  const own = actor?.id === ownerId && can(actor, 'site.readPrivate', ownerId);
  const rows = await Site.findAll({
    where: own ? { ownerId } : { ownerId, visibility: 'public' },
    attributes: ['publicId', 'name', 'visibility', 'updatedAt'],
    order: [['updatedAt', 'DESC']],
    limit: 200,
  });
  return rows.map((s) => ({
    id: s.publicId,
    name: s.name,
    visibility: s.visibility,
    updatedAt: s.updatedAt.toISOString(),
  }));
}

/**
 * The site a new question, field log test or worked calculation is about: the owner's
 * own only (a member cannot attach their question to someone else's site).
 */
export async function siteIdForLink(actor: Actor, publicId: string, transaction?: Transaction): Promise<number> {
  const { Site } = initModels();
  const site = await Site.findOne({ where: { publicId }, attributes: ['id', 'ownerId', 'visibility'], transaction });
  if (!site || !maySee(actor, site)) throw new SiteError(404, 'No such site.', 'siteId');
  if (!can(actor, 'site.edit', site.ownerId)) throw new SiteError(403, REFUSAL['site.edit'], 'siteId');
  return site.id;
}
