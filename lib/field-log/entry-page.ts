import { Op } from 'sequelize';
import { can, type Actor } from '@/lib/auth/policy';
import { initModels } from '@/models';
import { getEntry, linksOf, type EntryView } from './store';

export interface EntryPage {
  entry: EntryView;
  links: Awaited<ReturnType<typeof linksOf>>;
  photos: { id: string; alt: string | null; width: number; height: number }[];
  /** The viewer may link this entry to an earlier test of the same site. */
  mayLink: boolean;
  mayAsk: boolean;
  /** The author's other tests of the same site not yet linked as "before" this one (only when mayLink). */
  linkCandidates: { id: number; testedOn: string; pumpCount: number; arrangement: string; pumpSize: string }[];
}

/** Everything the field log entry page shows, as this viewer may see it; null when the entry is not there for them. */
export async function loadEntryPage(id: number, viewer: Actor | null): Promise<EntryPage | null> {
  const entry = await getEntry(id, viewer);
  if (!entry) return null;
  const { Photo, FieldLogEntry } = initModels();
  const links = await linksOf(id);
  const photoRows = await Photo.findAll({
    where: { fieldLogEntryId: id, ...(can(viewer, 'moderation.seeHidden') ? {} : { hiddenAt: null, deletedAt: null }) },
    order: [['id', 'ASC']],
  });
  const mayLink = can(viewer, 'fieldLog.edit', entry.authorId);
  let linkCandidates: EntryPage['linkCandidates'] = [];
  if (mayLink) {
    const rows = await FieldLogEntry.findAll({
      where: { authorId: entry.authorId, siteName: entry.siteName, id: { [Op.ne]: id }, deletedAt: null },
      order: [['testedOn', 'DESC']],
      attributes: ['id', 'testedOn', 'pumpCount', 'arrangement', 'pumpSize'],
    });
    const linked = new Set(links.filter((l) => l.afterId === id).map((l) => l.beforeId));
    linkCandidates = rows
      .filter((r) => !linked.has(r.id))
      .map((r) => ({
        id: r.id,
        testedOn: r.testedOn,
        pumpCount: r.pumpCount,
        arrangement: r.arrangement,
        pumpSize: r.pumpSize,
      }));
  }
  return {
    entry,
    links,
    photos: photoRows.map((r) => ({ id: r.publicId, alt: r.alt, width: r.width, height: r.height })),
    mayLink,
    mayAsk: can(viewer, 'question.ask'),
    linkCandidates,
  };
}
