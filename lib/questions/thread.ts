import { Op } from 'sequelize';
import { initModels } from '@/models';
import { ForumError } from './errors';
import { can, type Actor } from '@/lib/auth/policy';
import { findVisiblePost } from './visibility';
import type { PostType } from '@/lib/vocabulary';
import { maySee } from '@/lib/sites/store';

/** A photo with a post; `ref` is what a flag names, `hidden` only ever true for moderators. */
export interface PhotoView {
  id: string;
  ref: number;
  width: number;
  height: number;
  alt: string | null;
  hidden: boolean;
}
export interface PersonView {
  handle: string;
  displayName: string;
  expert: boolean;
}
export interface ReplyView {
  id: number;
  answerId: number | null;
  replyToId: number | null;
  depth: number;
  author: PersonView;
  body: string;
  helpfulCount: number;
  markedByViewer: boolean;
  createdAt: string;
  edited: boolean;
  cautionUnsafe: boolean;
  hiddenAt: string | null;
  /** why it is hidden: sent only to a reader who may see it hidden (its author, moderators) */
  hiddenReason: string | null;
  /** the reader wrote it (the author is shown their own hidden post, marked) */
  ownPost: boolean;
  /** open flags wait on it in the review queue (only ever true for moderators) */
  inQueue: boolean;
  deletedAt: string | null;
}
export interface AnswerView {
  id: number;
  author: PersonView;
  body: string;
  helpfulCount: number;
  markedByViewer: boolean;
  fixed: boolean;
  calculation: { id: string; tool: string; title: string | null; inputs: Record<string, string> } | null;
  photos: PhotoView[];
  createdAt: string;
  edited: boolean;
  cautionUnsafe: boolean;
  hiddenAt: string | null;
  /** why it is hidden: sent only to a reader who may see it hidden (its author, moderators) */
  hiddenReason: string | null;
  /** the reader wrote it (the author is shown their own hidden post, marked) */
  ownPost: boolean;
  /** open flags wait on it in the review queue (only ever true for moderators) */
  inQueue: boolean;
  deletedAt: string | null;
}
export interface ThreadView {
  id: number;
  title: string;
  body: string;
  author: PersonView & { id: number };
  tags: { slug: string; name: string }[];
  siteSheet: Record<string, string> | null;
  guideSlug: string | null;
  fieldLogEntryId: number | null;
  /** the site it is about, only when this reader may see that site */
  site: { id: string; name: string } | null;
  helpfulCount: number;
  markedByViewer: boolean;
  fixedAnswerId: number | null;
  /** the asker's one line saying what fixed it (null when nothing is chosen, or chosen before the line existed) */
  whatFixedIt: string | null;
  followedByViewer: boolean;
  photos: PhotoView[];
  answers: AnswerView[];
  replies: ReplyView[];
  createdAt: string;
  edited: boolean;
  cautionUnsafe: boolean;
  hiddenAt: string | null;
  /** why it is hidden: sent only to a reader who may see it hidden (its author, moderators) */
  hiddenReason: string | null;
  /** the reader wrote it (the author is shown their own hidden post, marked) */
  ownPost: boolean;
  /** open flags wait on it in the review queue (only ever true for moderators) */
  inQueue: boolean;
  deletedAt: string | null;
  lockedAt: string | null;
}

const person = (u: { handle: string; displayName: string; role: string } | undefined): PersonView => ({
  handle: u?.handle ?? 'unknown',
  displayName: u?.displayName ?? 'unknown',
  expert: u?.role === 'expert',
});

/**
 * A whole thread for the page and GET /api/questions/:id: answers ordered by
 * fixed it, then helpful marks, then age; replies in time order with their depth.
 */
export async function loadThread(id: number, viewer: Actor | null): Promise<ThreadView> {
  const viewerId = viewer?.id ?? null;
  const seeHidden = can(viewer, 'moderation.seeHidden');
  const {
    Question,
    Answer,
    Reply,
    User,
    Tag,
    WorkedCalculation,
    Photo,
    HelpfulMark,
    QuestionFollow,
    Revision,
    Flag,
    Site,
  } = initModels();
  // hidden and deleted photos are left out for everyone but moderators, like posts
  const photoInclude = {
    model: Photo,
    as: 'photos',
    attributes: ['id', 'publicId', 'width', 'height', 'alt', 'hiddenAt', 'deletedAt'],
    required: false,
    ...(seeHidden ? {} : { where: { hiddenAt: null, deletedAt: null } }),
  };
  const q = await Question.findByPk(id, {
    include: [
      { model: User, as: 'author', attributes: ['id', 'handle', 'displayName', 'role'] },
      { model: Tag, as: 'tags', attributes: ['slug', 'name'], through: { attributes: [] } },
      { model: Site, as: 'site', attributes: ['publicId', 'name', 'ownerId', 'visibility'], required: false },
      photoInclude,
    ],
  });
  // Hidden and deleted posts vanish for everyone but moderators, and a hidden one's author
  // (the same rule as findVisiblePost): they read it marked, with the reason.
  // (answers and replies: a hidden question takes the whole thread down, for its asker too)
  if (!q || (!seeHidden && (q.hiddenAt || q.deletedAt))) throw new ForumError(404, 'no such question', 'id');
  const visible = seeHidden
    ? {}
    : viewerId !== null
      ? { deletedAt: null, [Op.or]: [{ hiddenAt: null }, { authorId: viewerId }] }
      : { hiddenAt: null, deletedAt: null };
  const [answers, replies, follow] = await Promise.all([
    Answer.findAll({
      where: { questionId: id, ...visible },
      include: [
        { model: User, as: 'author', attributes: ['handle', 'displayName', 'role'] },
        { model: WorkedCalculation, as: 'calculation', attributes: ['publicId', 'tool', 'title', 'inputs'] },
        photoInclude,
      ],
    }),
    Reply.findAll({
      where: { questionId: id, ...visible },
      include: [{ model: User, as: 'author', attributes: ['handle', 'displayName', 'role'] }],
      order: [
        ['createdAt', 'ASC'],
        ['id', 'ASC'],
      ],
    }),
    viewerId ? QuestionFollow.findOne({ where: { questionId: id, userId: viewerId } }) : Promise.resolve(null),
  ]);
  // Every per-post lookup below is for this thread's posts only.
  const thisThread = [
    { postType: 'question' as const, postId: id },
    ...(answers.length ? [{ postType: 'answer' as const, postId: answers.map((a) => a.id) }] : []),
    ...(replies.length ? [{ postType: 'reply' as const, postId: replies.map((r) => r.id) }] : []),
  ];
  const [revisionCounts, marks, unsafeRows] = await Promise.all([
    // more than one revision means the post was edited
    Revision.count({ where: { [Op.or]: thisThread }, group: ['postType', 'postId'] }),
    viewerId
      ? HelpfulMark.findAll({ where: { userId: viewerId, [Op.or]: thisThread }, attributes: ['postType', 'postId'] })
      : Promise.resolve([]),
    // an open "unsafe advice" flag shows readers a caution until a moderator reviews it;
    // moderators also learn which posts wait in the queue, to open them there
    Flag.findAll({
      where: { status: 'open', ...(seeHidden ? {} : { reason: 'unsafe' }), [Op.or]: thisThread },
      attributes: ['postType', 'postId', 'reason'],
    }),
  ]);
  const unsafe = new Set(unsafeRows.filter((f) => f.reason === 'unsafe').map((f) => `${f.postType}:${f.postId}`));
  const flagged = new Set(seeHidden ? unsafeRows.map((f) => `${f.postType}:${f.postId}`) : []);
  const modState = (
    t: string,
    p: { id: number; authorId: number; hiddenAt?: Date | null; hiddenReason?: string | null; deletedAt?: Date | null },
  ) => ({
    cautionUnsafe: unsafe.has(`${t}:${p.id}`),
    inQueue: flagged.has(`${t}:${p.id}`),
    hiddenAt: p.hiddenAt?.toISOString() ?? null,
    hiddenReason: p.hiddenAt ? (p.hiddenReason ?? null) : null,
    ownPost: viewerId !== null && p.authorId === viewerId,
    deletedAt: p.deletedAt?.toISOString() ?? null,
  });
  const marked = new Set(marks.map((m) => `${m.postType}:${m.postId}`));
  const edits = new Map(
    (revisionCounts as unknown as { postType: string; postId: number; count: number }[]).map((r) => [
      `${r.postType}:${r.postId}`,
      Number(r.count),
    ]),
  );
  const edited = (t: string, pid: number) => (edits.get(`${t}:${pid}`) ?? 1) > 1;
  const photoView = (
    ps:
      | {
          id: number;
          publicId: string;
          width: number;
          height: number;
          alt: string | null;
          hiddenAt: Date | null;
          deletedAt: Date | null;
        }[]
      | undefined,
  ) =>
    (ps ?? []).map((p) => ({
      id: p.publicId,
      ref: p.id,
      width: p.width,
      height: p.height,
      alt: p.alt,
      hidden: !!(p.hiddenAt || p.deletedAt),
    }));

  const answerViews: AnswerView[] = answers
    .map((a) => {
      const calc = (
        a as unknown as {
          calculation?: { publicId: string; tool: string; title: string | null; inputs: Record<string, string> };
        }
      ).calculation;
      return {
        id: a.id,
        author: person(a.author),
        body: a.body,
        helpfulCount: a.helpfulCount,
        markedByViewer: marked.has(`answer:${a.id}`),
        fixed: q.fixedAnswerId === a.id,
        calculation: calc ? { id: calc.publicId, tool: calc.tool, title: calc.title, inputs: calc.inputs } : null,
        photos: photoView((a as unknown as { photos?: never[] }).photos),
        createdAt: a.createdAt.toISOString(),
        edited: edited('answer', a.id),
        ...modState('answer', a),
      };
    })
    .sort(
      (x, y) =>
        Number(y.fixed) - Number(x.fixed) || y.helpfulCount - x.helpfulCount || x.createdAt.localeCompare(y.createdAt),
    );

  return {
    id: q.id,
    title: q.title,
    body: q.body,
    author: { ...person(q.author), id: q.authorId as number },
    tags: (q.tags ?? []).map((t) => ({ slug: t.slug, name: t.name })),
    siteSheet: (q.siteSheet as Record<string, string> | null) ?? null,
    guideSlug: q.guideSlug ?? null,
    fieldLogEntryId: q.fieldLogEntryId ?? null,
    // a private site's name is its owner's alone; the cached page (no reader) names shared and public ones
    site: q.site && maySee(viewer, q.site) ? { id: q.site.publicId, name: q.site.name } : null,
    helpfulCount: q.helpfulCount,
    markedByViewer: marked.has(`question:${q.id}`),
    fixedAnswerId: q.fixedAnswerId,
    whatFixedIt: q.fixedAnswerId === null ? null : (q.whatFixedIt ?? null),
    followedByViewer: follow !== null,
    photos: photoView((q as unknown as { photos?: never[] }).photos),
    answers: answerViews,
    replies: replies.map((r) => ({
      id: r.id,
      answerId: r.answerId,
      replyToId: r.replyToId,
      depth: r.depth,
      author: person(r.author),
      body: r.body,
      helpfulCount: r.helpfulCount,
      markedByViewer: marked.has(`reply:${r.id}`),
      createdAt: r.createdAt.toISOString(),
      edited: edited('reply', r.id),
      ...modState('reply', r),
    })),
    createdAt: q.createdAt.toISOString(),
    edited: edited('question', q.id),
    ...modState('question', q),
    lockedAt: q.lockedAt?.toISOString() ?? null,
  };
}

/**
 * Every version of a post, oldest first, for a reader who may see the post itself
 * (`findVisiblePost`: hidden and deleted posts, or any post of a hidden thread, are
 * not found but for moderators); an answer or reply must belong to `questionId`.
 */
export async function listRevisions(viewer: Actor | null, questionId: number, postType: PostType, postId: number) {
  await findVisiblePost(viewer, postType, postId, { questionId });
  const { Revision, User } = initModels();
  const rows = await Revision.findAll({
    where: { postType, postId },
    include: [{ model: User, as: 'editor', attributes: ['handle', 'displayName'] }],
    order: [
      ['createdAt', 'ASC'],
      ['id', 'ASC'],
    ],
  });
  return rows.map((r) => ({
    id: r.id,
    title: r.title,
    body: r.body,
    editor: r.editor?.displayName ?? 'unknown',
    at: r.createdAt.toISOString(),
  }));
}
