import { Op } from 'sequelize';
import { initModels } from '@/models';
import { MODERATED_TYPES, type FlagReason, type ModeratedType } from '@/lib/vocabulary';
import type { Role } from '@/lib/auth/policy';
import { photoQuestionId } from './posts';

/**
 * Posts with open flags, and authors' open appeals: those flagged as unsafe advice first
 * (a reader may act on such advice while it waits), then the oldest flag or appeal first;
 * each with its context, the flaggers' notes and its revisions.
 */
export async function reviewQueue(filter: { reason?: FlagReason; olderThanHours?: number }) {
  const { Flag, User, Question, Answer, Reply, Revision, Tag, Photo, FieldLogEntry, Appeal } = initModels();
  const where: Record<string | symbol, unknown> = { status: 'open', postType: { [Op.in]: [...MODERATED_TYPES] } };
  if (filter.reason) where.reason = filter.reason;
  if (filter.olderThanHours) where.createdAt = { [Op.lte]: new Date(Date.now() - filter.olderThanHours * 3_600_000) };
  const flags = await Flag.findAll({
    where,
    include: [{ model: User, as: 'flagger', attributes: ['handle', 'displayName', 'role'] }],
    order: [['createdAt', 'ASC']],
    limit: 500,
  });
  const groups = new Map<string, typeof flags>();
  for (const f of flags) {
    const k = `${f.postType}:${f.postId}`;
    groups.set(k, [...(groups.get(k) ?? []), f]);
  }
  // each open appeal is an item of its own, beside any flags on the same post
  const appeals = filter.reason
    ? []
    : await Appeal.findAll({
        where: {
          status: 'open',
          ...(filter.olderThanHours
            ? { createdAt: { [Op.lte]: new Date(Date.now() - filter.olderThanHours * 3_600_000) } }
            : {}),
        },
        include: [{ model: User, as: 'user', attributes: ['handle', 'displayName'] }],
        order: [['createdAt', 'ASC']],
        limit: 200,
      });
  const targets = [
    ...[...groups].map(([k, fs]) => ({ k, fs, appeal: null as (typeof appeals)[number] | null })),
    ...appeals.map((a) => ({ k: `${a.postType}:${a.postId}`, fs: [] as typeof flags, appeal: a })),
  ];
  const items = [];
  for (const { k, fs, appeal } of targets) {
    const [type, idText] = k.split(':') as [ModeratedType, string];
    const id = Number(idText);
    type QueuedPost = {
      id: number;
      body: string;
      questionId?: number | null;
      hiddenAt: Date | null;
      hiddenReason?: string | null;
      deletedAt: Date | null;
      createdAt: Date;
      author?: { id: number; handle: string; displayName: string; role: Role };
      photoId?: string;
    };
    let post: QueuedPost | null;
    if (type === 'field-log') {
      const entry = await FieldLogEntry.findByPk(id);
      const author = entry
        ? await User.findByPk(entry.authorId, { attributes: ['id', 'handle', 'displayName', 'role'] })
        : null;
      post = entry
        ? {
            id: entry.id,
            body: `Field log: ${entry.siteName} (${entry.testedOn}). ${entry.notes}`.trim(),
            questionId: null,
            hiddenAt: entry.hiddenAt ?? null,
            hiddenReason: entry.hiddenReason ?? null,
            deletedAt: entry.deletedAt ?? null,
            createdAt: entry.createdAt,
            author: author ?? undefined,
          }
        : null;
    } else if (type === 'photo') {
      const photo = await Photo.findByPk(id);
      const owner = photo
        ? await User.findByPk(photo.ownerId, { attributes: ['id', 'handle', 'displayName', 'role'] })
        : null;
      post = photo
        ? {
            id: photo.id,
            body: photo.alt ?? '',
            questionId: await photoQuestionId(photo),
            hiddenAt: photo.hiddenAt ?? null,
            hiddenReason: photo.hiddenReason ?? null,
            deletedAt: photo.deletedAt ?? null,
            createdAt: photo.createdAt,
            author: owner ?? undefined,
            photoId: photo.publicId,
          }
        : null;
    } else {
      const model = { question: Question, answer: Answer, reply: Reply }[type] as unknown as typeof Answer;
      post = (await model.findByPk(id, {
        include: [{ model: User, as: 'author', attributes: ['id', 'handle', 'displayName', 'role'] }],
      })) as unknown as QueuedPost | null;
    }
    if (!post) continue;
    const questionId = type === 'question' ? post.id : (post.questionId ?? 0);
    const q = await Question.findByPk(questionId, {
      attributes: ['id', 'title', 'lockedAt'],
      include: [{ model: Tag, as: 'tags', attributes: ['slug'], through: { attributes: [] } }],
    });
    const revisions = await Revision.findAll({
      where: { postType: type, postId: id },
      include: [{ model: User, as: 'editor', attributes: ['displayName'] }],
      order: [['createdAt', 'ASC']],
    });
    items.push({
      post: {
        type,
        id,
        questionId,
        questionTitle: q?.title ?? '',
        body: post.body,
        author: post.author
          ? {
              id: post.author.id,
              handle: post.author.handle,
              displayName: post.author.displayName,
              role: post.author.role,
            }
          : null,
        hiddenAt: post.hiddenAt?.toISOString() ?? null,
        hiddenReason: post.hiddenReason ?? null,
        deletedAt: post.deletedAt?.toISOString() ?? null,
        createdAt: post.createdAt.toISOString(),
        tags: (q?.tags ?? []).map((t) => t.slug),
        lockedAt: type === 'question' ? (q?.lockedAt?.toISOString() ?? null) : undefined,
        photoId: post.photoId ?? null,
      },
      appeal: appeal
        ? {
            id: appeal.id,
            text: appeal.text,
            by: appeal.user?.displayName ?? 'the author',
            createdAt: appeal.createdAt.toISOString(),
          }
        : null,
      flags: fs.map((f) => ({
        id: f.id,
        reason: f.reason,
        note: f.note,
        flagger: {
          handle: f.flagger?.handle ?? '',
          displayName: f.flagger?.displayName ?? '',
          role: f.flagger?.role ?? 'member',
        },
        createdAt: f.createdAt.toISOString(),
      })),
      revisions: revisions.map((r) => ({
        body: r.body,
        at: r.createdAt.toISOString(),
        editor: r.editor?.displayName ?? 'unknown',
      })),
    });
  }
  // unsafe advice first, then the oldest flag or appeal
  type Keys = { flags: { reason: string; createdAt: string }[]; appeal: { createdAt: string } | null };
  const unsafe = (i: Keys) => (i.flags.some((f) => f.reason === 'unsafe') ? 0 : 1);
  const since = (i: Keys) => i.appeal?.createdAt ?? i.flags[0]?.createdAt ?? '';
  items.sort((a, b) => unsafe(a) - unsafe(b) || since(a).localeCompare(since(b)));
  return { items };
}
