import { QueryTypes } from 'sequelize';
import { getSequelize } from '@/lib/db';
import { MAX_NUMBERED_PAGE, placeText, type ListPlace } from '@/lib/validation/list-page';
import { ForumError } from './errors';

export interface QuestionSummary {
  id: number;
  title: string;
  excerpt: string;
  answerCount: number;
  fixed: boolean;
  /** where the question stands, in our words (components/questions/state-words.ts) */
  state: QuestionState;
  /** the site sheet as the asker typed it; the list shows it in the reader's units */
  siteSheet: Record<string, string> | null;
  author: { handle: string; displayName: string };
  tags: { slug: string; name: string }[];
  createdAt: string;
}

/**
 * Where a question stands: nobody has answered yet, answers are coming in, or the
 * asker chose the answer that fixed it (with their line, and the answer to link to).
 */
export type QuestionState =
  { kind: 'waiting' } | { kind: 'worked-on' } | { kind: 'fixed'; line: string | null; answerId: number };

export function questionState(q: { answerCount: number; fixedAnswerId: number | null; whatFixedIt: string | null }) {
  const state: QuestionState =
    q.fixedAnswerId !== null
      ? { kind: 'fixed', line: q.whatFixedIt, answerId: q.fixedAnswerId }
      : q.answerCount === 0
        ? { kind: 'waiting' }
        : { kind: 'worked-on' };
  return state;
}

export interface QuestionPage {
  /** the page's number when reached by number (the first MAX_NUMBERED_PAGE), null when reached by place */
  page: number | null;
  perPage: number;
  total: number;
  totalPages: number;
  items: QuestionSummary[];
  /** `before=` for the newer page, null on the newest */
  newer: string | null;
  /** `after=` for the older page, null on the oldest */
  older: string | null;
}

const EXCERPT = 180;

export type ListFilter =
  | { kind: 'newest' }
  | { kind: 'unanswered' }
  | { kind: 'tag'; tag: string }
  | { kind: 'mine'; userId: number }
  | { kind: 'followed'; userId: number };

/** Where a page starts: by number (first pages), or just after or before a question. */
export type ListPosition = { perPage: number; page?: number; after?: ListPlace; before?: ListPlace };

const select = <T extends object>(sql: string, replacements: Record<string, unknown>) =>
  getSequelize().query<T>(sql, { type: QueryTypes.SELECT, replacements });

/**
 * One filter as SQL over an index that holds its questions newest first, visible ones
 * only, so a page is a short read of the index from any point (migrations 009, 017):
 * `at` and `id` name the columns the order and the place compare.
 */
function source(filter: ListFilter, tagId: number | null) {
  const visible = 'q.hidden_at IS NULL AND q.deleted_at IS NULL';
  switch (filter.kind) {
    case 'unanswered':
      return { from: 'questions q', where: `q.answer_count = 0 AND ${visible}`, at: 'q.created_at', id: 'q.id' };
    case 'mine':
      return { from: 'questions q', where: `q.author_id = :userId AND ${visible}`, at: 'q.created_at', id: 'q.id' };
    case 'followed':
      return {
        from: 'question_follows f JOIN questions q ON q.id = f.question_id',
        where: `f.user_id = :userId AND ${visible}`,
        at: 'q.created_at',
        id: 'q.id',
      };
    case 'tag':
      // the tag's rows carry their question's time and visibility (kept by migration 017's triggers)
      return {
        from: 'question_tags qt',
        where: `qt.tag_id = ${Number(tagId)} AND qt.question_listed = 1`,
        at: 'qt.question_created_at',
        id: 'qt.question_id',
      };
    default:
      return { from: 'questions q', where: visible, at: 'q.created_at', id: 'q.id' };
  }
}

/** The public lists' counts are kept in question_list_counts; a member's own lists are small and counted. */
async function countOf(filter: ListFilter, tagId: number | null): Promise<number> {
  if (filter.kind === 'mine' || filter.kind === 'followed') {
    const s = source(filter, tagId);
    const [row] = await select<{ n: number }>(`SELECT COUNT(*) AS n FROM ${s.from} WHERE ${s.where}`, {
      userId: filter.userId,
    });
    return Number(row?.n ?? 0);
  }
  const list = filter.kind === 'tag' ? `tag:${tagId}` : filter.kind === 'unanswered' ? 'unanswered' : 'all';
  const [row] = await select<{ n: number }>('SELECT questions AS n FROM question_list_counts WHERE list = :list', {
    list,
  });
  return Math.max(0, Number(row?.n ?? 0));
}

/** The ids of one page, newest first, and whether there are more beyond each end. */
async function pageIds(filter: ListFilter, tagId: number | null, at: ListPosition) {
  const s = source(filter, tagId);
  const userId = 'userId' in filter ? filter.userId : null;
  const n = at.perPage;
  const keys = `${s.at} AS at, ${s.id} AS id`;
  if (at.after || at.before) {
    const p = (at.after ?? at.before)!;
    const older = !!at.after;
    // (at, id) past the place, written so the optimiser reads it as a range of the index
    const past = older
      ? `(${s.at} < :at OR (${s.at} = :at AND ${s.id} < :id))`
      : `(${s.at} > :at OR (${s.at} = :at AND ${s.id} > :id))`;
    const dir = older ? 'DESC' : 'ASC';
    const rows = await select<{ at: Date; id: number }>(
      `SELECT ${keys} FROM ${s.from} WHERE ${s.where} AND ${past} ORDER BY ${s.at} ${dir}, ${s.id} ${dir} LIMIT ${n + 1}`,
      { userId, at: p.createdAt, id: p.id },
    );
    const more = rows.length > n;
    const page = rows.slice(0, n);
    if (older) return { rows: page, newerExists: true, olderExists: more };
    // a newer page that reaches the newest question is the first page, as a reader opening the list sees it
    if (!more) return null;
    return { rows: page.reverse(), newerExists: true, olderExists: true };
  }
  const number = at.page ?? 1;
  if (number > MAX_NUMBERED_PAGE) throw new ForumError(400, `page must be at most ${MAX_NUMBERED_PAGE}`, 'page');
  const rows = await select<{ at: Date; id: number }>(
    `SELECT ${keys} FROM ${s.from} WHERE ${s.where} ORDER BY ${s.at} DESC, ${s.id} DESC LIMIT ${n + 1} OFFSET ${(number - 1) * n}`,
    { userId },
  );
  return { rows: rows.slice(0, n), newerExists: number > 1, olderExists: rows.length > n };
}

/** The rows a list shows for these ids, in the ids' order: three reads by primary key, none per row. */
async function summaries(ids: number[]): Promise<QuestionSummary[]> {
  if (ids.length === 0) return [];
  const [rows, tags] = await Promise.all([
    select<{
      id: number;
      title: string;
      // the start of the body: enough for the excerpt, never the whole text
      bodyStart: string;
      answerCount: number;
      fixedAnswerId: number | null;
      whatFixedIt: string | null;
      siteSheet: string | Record<string, string> | null;
      createdAt: Date;
      handle: string | null;
      displayName: string | null;
    }>(
      `SELECT q.id, q.title, LEFT(q.body, ${EXCERPT + 1}) AS bodyStart, q.answer_count AS answerCount,
              q.fixed_answer_id AS fixedAnswerId, q.what_fixed_it AS whatFixedIt, q.site_sheet AS siteSheet,
              q.created_at AS createdAt, u.handle, u.display_name AS displayName
         FROM questions q LEFT JOIN users u ON u.id = q.author_id
        WHERE q.id IN (:ids)`,
      { ids },
    ),
    select<{ questionId: number; slug: string; name: string }>(
      `SELECT qt.question_id AS questionId, t.slug, t.name FROM question_tags qt JOIN tags t ON t.id = qt.tag_id
        WHERE qt.question_id IN (:ids) ORDER BY qt.question_id, qt.tag_id`,
      { ids },
    ),
  ]);
  const tagsOf = new Map<number, { slug: string; name: string }[]>();
  for (const t of tags) tagsOf.set(t.questionId, [...(tagsOf.get(t.questionId) ?? []), { slug: t.slug, name: t.name }]);
  const byId = new Map(rows.map((q) => [q.id, q]));
  return ids.flatMap((id) => {
    const q = byId.get(id);
    if (!q) return [];
    const sheet =
      typeof q.siteSheet === 'string' ? (JSON.parse(q.siteSheet) as Record<string, string> | null) : q.siteSheet;
    return [
      {
        id: q.id,
        title: q.title,
        excerpt: q.bodyStart.length > EXCERPT ? `${q.bodyStart.slice(0, EXCERPT).trimEnd()}…` : q.bodyStart,
        answerCount: q.answerCount,
        fixed: q.fixedAnswerId !== null,
        state: questionState(q),
        siteSheet: sheet ?? null,
        author: { handle: q.handle ?? 'unknown', displayName: q.displayName ?? 'unknown' },
        tags: tagsOf.get(q.id) ?? [],
        createdAt: new Date(q.createdAt).toISOString(),
      },
    ];
  });
}

/**
 * Newest questions first, one page at a time, optionally filtered. Hidden and deleted
 * questions never appear (moderators find them in the review queue and on the thread).
 * The first pages go by number; from there each page links the next by place.
 */
export async function listQuestions(at: ListPosition, filter: ListFilter = { kind: 'newest' }): Promise<QuestionPage> {
  let tagId: number | null = null;
  if (filter.kind === 'tag') {
    const [tag] = await select<{ id: number }>('SELECT id FROM tags WHERE slug = :slug', { slug: filter.tag });
    tagId = tag?.id ?? null;
  }
  const empty = filter.kind === 'tag' && tagId === null;
  const [found, total] = empty
    ? [{ rows: [], newerExists: false, olderExists: false }, 0]
    : await Promise.all([pageIds(filter, tagId, at), countOf(filter, tagId)]);
  const shown = found ?? (await pageIds(filter, tagId, { perPage: at.perPage, page: 1 }))!;
  const numbered = found === null || !(at.after || at.before);
  const page = numbered ? (found === null ? 1 : (at.page ?? 1)) : null;
  const items = await summaries(shown.rows.map((r) => Number(r.id)));
  const first = shown.rows[0];
  const last = shown.rows[shown.rows.length - 1];
  return {
    page,
    perPage: at.perPage,
    total,
    totalPages: Math.max(1, Math.ceil(total / at.perPage)),
    items,
    newer: shown.newerExists && first ? placeText({ createdAt: first.at, id: Number(first.id) }) : null,
    older: shown.olderExists && last ? placeText({ createdAt: last.at, id: Number(last.id) }) : null,
  };
}
