import 'server-only';
import type { Transaction } from 'sequelize';
import { initModels } from '@/models';
import { getSequelize } from '@/lib/db';
import { saveWorkedCalculation, type NewWorkedCalculation } from '@/lib/calculations/store';
import { can, type Actor } from '@/lib/auth/policy';
import { ForumError } from '@/lib/questions/errors';
import { threadChanged } from '@/lib/questions/after-write';
import type { UnitSystem } from '@/lib/hydraulics';
import type { QuestionStateKind } from '@/lib/vocabulary';
import type { SiteSheet } from '@/lib/calculators/site-sheet';
import { listSites, loadSite, maySee, SiteError, siteIdForLink } from './store';
import { planSiteSheet } from './sheet';

/**
 * A site's links: the questions asked about it and the worked calculations made from it.
 * Only the owner links a post to a site (siteIdForLink); who reads the link is the site's
 * own rule (maySee), so a private site's name never reaches anyone else.
 */

/** The internal id of the actor's own site for a new question or calculation; a refusal names `siteId`. */
export async function linkedSiteId(
  actor: Actor,
  publicId: string | undefined,
  transaction: Transaction,
): Promise<number | null> {
  if (publicId === undefined) return null;
  try {
    return await siteIdForLink(actor, publicId, transaction);
  } catch (err) {
    if (err instanceof SiteError) throw new ForumError(err.status, err.message, 'siteId');
    throw err;
  }
}

/** A worked calculation, linked to the author's own site when one is named: the check and the save in one transaction. */
export async function saveSiteCalculation(actor: Actor, sitePublicId: string | undefined, c: NewWorkedCalculation) {
  if (sitePublicId === undefined) return saveWorkedCalculation(c);
  return getSequelize().transaction(async (transaction) => {
    const siteId = await linkedSiteId(actor, sitePublicId, transaction);
    return saveWorkedCalculation({ ...c, siteId }, transaction);
  });
}

/**
 * The threads about a site are drawn once for every reader (lib/questions/after-write.ts), with
 * the site's name only when anyone may see it: a change of name or visibility redraws them.
 */
export async function siteThreadsChanged(publicId: string): Promise<void> {
  const { Site, Question } = initModels();
  const site = await Site.findOne({ where: { publicId }, attributes: ['id'] });
  if (!site) return;
  const rows = await Question.findAll({ where: { siteId: site.id }, attributes: ['id'] });
  for (const q of rows) threadChanged(q.id);
}

export interface SiteQuestionItem {
  id: number;
  title: string;
  createdAt: string;
  /** where it stands, in the lists' words (lib/vocabulary QUESTION_STATES) */
  state: QuestionStateKind;
  /** hidden or deleted: listed only for moderators, marked */
  takenDown: boolean;
}
export interface SiteCalculationItem {
  id: string;
  tool: string;
  title: string | null;
  createdAt: string;
}

/**
 * What was asked about a site and worked out from it, for a reader who may see the site.
 * Hidden and deleted questions are gone for everyone but moderators, as in the thread.
 */
export async function siteLinks(
  viewer: Actor | null,
  publicId: string,
): Promise<{ questions: SiteQuestionItem[]; calculations: SiteCalculationItem[] } | null> {
  const { Site, Question, WorkedCalculation } = initModels();
  const site = await Site.findOne({ where: { publicId }, attributes: ['id', 'ownerId', 'visibility'] });
  if (!site || !maySee(viewer, site)) return null;
  const seeHidden = can(viewer, 'moderation.seeHidden');
  const [questions, calculations] = await Promise.all([
    Question.findAll({
      where: { siteId: site.id, ...(seeHidden ? {} : { hiddenAt: null, deletedAt: null }) },
      attributes: ['id', 'title', 'createdAt', 'answerCount', 'fixedAnswerId', 'hiddenAt', 'deletedAt'],
      order: [
        ['createdAt', 'DESC'],
        ['id', 'DESC'],
      ],
      limit: 100,
    }),
    WorkedCalculation.findAll({
      where: { siteId: site.id },
      attributes: ['publicId', 'tool', 'title', 'createdAt'],
      order: [
        ['createdAt', 'DESC'],
        ['id', 'DESC'],
      ],
      limit: 100,
    }),
  ]);
  return {
    questions: questions.map((q) => ({
      id: q.id,
      title: q.title,
      createdAt: q.createdAt.toISOString(),
      state: q.fixedAnswerId !== null ? 'fixed' : q.answerCount === 0 ? 'waiting' : 'worked-on',
      takenDown: !!(q.hiddenAt || q.deletedAt),
    })),
    calculations: calculations.map((c) => ({
      id: c.publicId,
      tool: c.tool,
      title: c.title,
      createdAt: c.createdAt.toISOString(),
    })),
  };
}

/**
 * The ask form's start from the asker's own site: its newest survey and plan as a site sheet
 * in the asker's units. Anyone else's site (or none) gives nothing: the form opens empty.
 */
export async function askFromSite(
  actor: Actor,
  publicId: string,
  units: UnitSystem,
): Promise<{ id: string; name: string; siteSheet: SiteSheet } | null> {
  try {
    const site = await loadSite(actor, publicId);
    if (!site.mine || !can(actor, 'site.edit', actor.id)) return null;
    return { id: site.id, name: site.name, siteSheet: planSiteSheet(site.current.survey, site.current.plan, units) };
  } catch (err) {
    if (err instanceof SiteError) return null;
    throw err;
  }
}

/** A calculator opened from the asker's own site: the site's name and the inputs it starts from. */
export async function ownSiteForCalculator(actor: Actor | null, publicId: string) {
  if (!actor) return null;
  try {
    const site = await loadSite(actor, publicId);
    return site.mine ? site : null;
  } catch (err) {
    if (err instanceof SiteError) return null;
    throw err;
  }
}

/**
 * The sites on a member's page: their public ones for everyone; the member themself sees
 * all of their own, each with who may see it.
 */
export async function sitesOnProfile(viewer: Actor | null, ownerId: number) {
  const own = viewer?.id === ownerId && can(viewer, 'site.readPrivate', ownerId);
  const sites = await listSites(viewer, ownerId);
  return { own, sites: own ? sites : sites.filter((s) => s.visibility === 'public') };
}
