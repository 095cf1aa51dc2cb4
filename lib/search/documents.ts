import 'server-only';
import GithubSlugger from 'github-slugger';
import { Op } from 'sequelize';
import { listGuides, type GuideFile } from '@/lib/guides/content';
import { initModels } from '@/models';
import { SYMPTOM_LABELS, type PipeSeries, type Symptom } from '@/lib/hydraulics';
import { SERIES_LABELS } from '@/lib/calculators/pipes';
import { SITE_SHEET_LABELS } from '@/lib/calculators/site-sheet';
import type { SiteSheetField } from '@/lib/validation/question';
import { entryTitle } from '@/lib/field-log/title';
import { markdownToPlain, texToPlain } from './plain-text';

export const SEARCH_KINDS = ['guide', 'question', 'answer', 'reply', 'field-log'] as const;
export type SearchKind = (typeof SEARCH_KINDS)[number];

/** One searchable thing: a guide section, a post, a field log entry. */
export interface SearchDoc {
  /** `question-12`, `answer-40`, `guide-the-drive-pipe--friction` (letters, digits, - and _ only) */
  id: string;
  kind: SearchKind;
  title: string;
  /**
   * What ranks above the text: a question's title and tags, a guide section's heading
   * (the guide's title and tags for its opening). Answers and replies show their
   * thread's title but rank on their own words, so the question comes before them.
   */
  head: string;
  url: string;
  /** the text searched and quoted in snippets (after the title) */
  text: string;
  tags: string[];
  /** the thread has an answer that fixed it (null for guides) */
  solved: boolean | null;
  /** a guide's level (null for posts) */
  level: string | null;
  /** hidden or deleted, itself or its thread: only moderators find it */
  hidden: boolean;
  /** ISO date of the post, or of the guide's last update */
  date: string;
  /** the question's id for posts: used to reindex or drop a thread at once */
  threadId: number | null;
}

const tagWords = (tags: string[]) => tags.map((t) => t.replace(/-/g, ' ')).join(' ');

/** MDX to readable words: drop imports, JSX tags (keep their text), Markdown marks. */
export function mdxToText(mdx: string): string {
  return (
    mdx
      // a guide carries both unit systems (<U>, <ForUnits>); index one, the default, so
      // a snippet reads as one sentence rather than with holes or every number twice
      .replace(/<ForUnits system="metric">[\s\S]*?<\/ForUnits>/g, ' ')
      .replace(/<U\s+us="([^"]*)"\s+metric="[^"]*"\s*\/>/g, '$1')
      .replace(/^(import|export)\s.*$/gm, '')
      .replace(/<[A-Z][\w.]*(?:\s[^>]*?)?\/>/gs, ' ')
      .replace(/<\/?[A-Za-z][\w.]*(?:\s[^>]*?)?>/gs, ' ')
      .replace(/!\[([^\]]*)\]\([^)]*\)/g, '$1')
      .replace(/\[([^\]]*)\]\([^)]*\)/g, '$1')
      .replace(/\$\$?([^$]*)\$\$?/g, (_, tex: string) => ` ${texToPlain(tex)} `)
      .replace(/^\s*(?:[-+*]|\d+[.)])\s+/gm, '')
      .replace(/[*_`>#|~]+/g, ' ')
      .replace(/[ \t]+/g, ' ')
      .replace(/\n{2,}/g, '\n')
      .trim()
  );
}

/** A guide cut at its h2/h3 headings; anchors as rehype-slug makes them (github-slugger). */
export function guideSections(guide: GuideFile): SearchDoc[] {
  const slugger = new GithubSlugger();
  let current: { heading: string | null; anchor: string | null; lines: string[] } = {
    heading: null,
    anchor: null,
    lines: [],
  };
  const sections = [current];
  let inFence = false;
  for (const line of guide.body.split('\n')) {
    if (/^```/.test(line)) inFence = !inFence;
    const title = inFence ? undefined : /^(#{2,3})\s+(.+?)\s*#*$/.exec(line)?.[2];
    if (title !== undefined) {
      const heading = mdxToText(title);
      current = { heading, anchor: slugger.slug(heading), lines: [] };
      sections.push(current);
    } else current.lines.push(line);
  }
  return sections
    .map((s) => ({ ...s, text: mdxToText(s.lines.join('\n')) }))
    .filter((s) => s.heading || s.text)
    .map((s) => ({
      id: `guide-${guide.slug}${s.anchor ? `--${s.anchor.replace(/[^a-z0-9_-]/g, '')}` : ''}`,
      kind: 'guide' as const,
      title: s.heading ? `${guide.meta.title}: ${s.heading}` : guide.meta.title,
      head: s.heading ?? `${guide.meta.title}\n${tagWords(guide.meta.tags)}`,
      url: `/guides/${guide.slug}${s.anchor ? `#${s.anchor}` : ''}`,
      text: s.heading ? s.text : `${guide.meta.summary}\n${s.text}`,
      tags: guide.meta.tags,
      solved: null,
      level: guide.meta.level,
      hidden: false,
      date: new Date(`${guide.meta.updated}T00:00:00Z`).toISOString(),
      threadId: null,
    }));
}

export function allGuideDocs(): SearchDoc[] {
  return listGuides().flatMap(guideSections);
}

/**
 * A site sheet as the words a reader sees on the thread: its labels, materials and symptoms
 * in words (never the stored codes), measurements as typed (the search page puts them in the
 * reader's units). Nominal sizes keep "inch" so a search in millimetres finds them.
 */
export function siteSheetText(sheet: Record<string, unknown> | null | undefined): string {
  if (!sheet) return '';
  return Object.entries(sheet)
    .filter(([, v]) => v !== null && v !== undefined && v !== '')
    .map(([k, v]) => {
      const value = Array.isArray(v) ? v.join(', ') : String(v);
      const label = SITE_SHEET_LABELS[k as SiteSheetField] ?? k.replace(/([a-z])([A-Z])/g, '$1 $2').toLowerCase();
      return `${label} ${siteSheetValueWords(k, value)}`;
    })
    .join('; ');
}

function siteSheetValueWords(key: string, value: string): string {
  // nominal sizes are stored as inches without the unit ("3/4", "1-1/4")
  if (/size$/i.test(key) && /^\d[\d/.\s-]*$/.test(value)) return `${value} inch`;
  if (/material$/i.test(key)) return SERIES_LABELS[value as PipeSeries] ?? materialWords(value);
  if (key === 'symptoms')
    return value
      .split(',')
      .map((x) => SYMPTOM_LABELS[x.trim() as Symptom] ?? x.trim().replace(/-/g, ' '))
      .join(', ');
  return value;
}

/** "galvanized-steel" → "galvanized steel", "pvc" → "PVC". */
const materialWords = (m: string) => m.replace(/-/g, ' ').replace(/\b(pvc|hdpe)\b/g, (x) => x.toUpperCase());

interface QuestionRow {
  id: number;
  title: string;
  body: string;
  siteSheet: Record<string, unknown> | null;
  fixedAnswerId: number | null;
  hiddenAt: Date | null;
  deletedAt: Date | null;
  createdAt: Date;
  tags?: { slug: string }[];
}

function questionDoc(q: QuestionRow): SearchDoc {
  const sheet = siteSheetText(q.siteSheet);
  const tags = (q.tags ?? []).map((t) => t.slug);
  return {
    id: `question-${q.id}`,
    kind: 'question',
    title: q.title,
    head: `${q.title}\n${tagWords(tags)}`,
    url: `/questions/${q.id}`,
    text: sheet ? `${sheet}\n${markdownToPlain(q.body)}` : markdownToPlain(q.body),
    tags,
    solved: q.fixedAnswerId !== null,
    level: null,
    hidden: Boolean(q.hiddenAt || q.deletedAt),
    date: q.createdAt.toISOString(),
    threadId: q.id,
  };
}

interface PostRow {
  id: number;
  questionId: number;
  body: string;
  hiddenAt: Date | null;
  deletedAt: Date | null;
  createdAt: Date;
}

function postDoc(kind: 'answer' | 'reply', p: PostRow, q: SearchDoc): SearchDoc {
  return {
    id: `${kind}-${p.id}`,
    kind,
    title: q.title,
    head: '',
    url: `${q.url}#${kind}-${p.id}`,
    text: markdownToPlain(p.body),
    tags: q.tags,
    solved: q.solved,
    level: null,
    hidden: q.hidden || Boolean(p.hiddenAt || p.deletedAt),
    date: p.createdAt.toISOString(),
    threadId: q.threadId,
  };
}

const Q_ATTRS = ['id', 'title', 'body', 'siteSheet', 'fixedAnswerId', 'hiddenAt', 'deletedAt', 'createdAt'];
const P_ATTRS = ['id', 'questionId', 'body', 'hiddenAt', 'deletedAt', 'createdAt'];

/** Every document of the given threads: the question, its answers and replies. */
export async function threadDocs(questionIds: number[]): Promise<SearchDoc[]> {
  if (questionIds.length === 0) return [];
  const { Question, Answer, Reply, Tag } = initModels();
  const [questions, answers, replies] = await Promise.all([
    Question.findAll({
      attributes: Q_ATTRS,
      where: { id: { [Op.in]: questionIds } },
      include: [{ model: Tag, as: 'tags', attributes: ['slug'], through: { attributes: [] } }],
    }),
    Answer.findAll({ attributes: P_ATTRS, where: { questionId: { [Op.in]: questionIds } }, raw: true }),
    Reply.findAll({ attributes: P_ATTRS, where: { questionId: { [Op.in]: questionIds } }, raw: true }),
  ]);
  const byId = new Map(questions.map((q) => [q.id, questionDoc(q.get({ plain: true }) as QuestionRow)]));
  const out = [...byId.values()];
  for (const a of answers as unknown as PostRow[]) {
    const q = byId.get(a.questionId);
    if (q) out.push(postDoc('answer', a, q));
  }
  for (const r of replies as unknown as PostRow[]) {
    const q = byId.get(r.questionId);
    if (q) out.push(postDoc('reply', r, q));
  }
  return out;
}

/** Field log entries as search documents: site, pumps and measurements as typed, notes. */
export async function fieldLogDocs(ids?: number[]): Promise<SearchDoc[]> {
  const { FieldLogEntry } = initModels();
  const rows = await FieldLogEntry.findAll({
    attributes: [
      'id',
      'siteName',
      'testedOn',
      'pumpType',
      'pumpSize',
      'fallM',
      'liftM',
      'pumpCount',
      'arrangement',
      'driveMaterial',
      'driveFlowMethod',
      'driveFlowHow',
      'wasteValveSetting',
      'notes',
      'typed',
      'hiddenAt',
      'deletedAt',
    ],
    where: ids ? { id: { [Op.in]: ids } } : {},
    order: [['id', 'ASC']],
  });
  return rows.map((e) => {
    const t = (e.typed ?? {}) as Record<string, string>;
    // indexed in metric; search() puts the numbers into each reader's units
    const title = entryTitle(e, 'metric');
    return {
      id: `field-log-${e.id}`,
      kind: 'field-log' as const,
      title,
      head: title,
      url: `/field-log/${e.id}`,
      text: [
        e.notes ? markdownToPlain(e.notes) : '',
        `drive pipe ${t.driveLength ?? ''} of ${t.driveSize ?? e.driveSize} inch ${materialWords(e.driveMaterial)}`,
        `drive flow ${t.driveFlow ?? ''} (${e.driveFlowMethod}${e.driveFlowHow ? `: ${e.driveFlowHow}` : ''})`,
        t.trials ? `bucket trials ${t.trials}` : '',
        e.wasteValveSetting ? `waste valve ${e.wasteValveSetting}` : '',
      ]
        .filter(Boolean)
        .join('\n'),
      tags: [],
      solved: null,
      level: null,
      hidden: Boolean(e.hiddenAt || e.deletedAt),
      date: new Date(`${e.testedOn}T00:00:00Z`).toISOString(),
      threadId: null,
    };
  });
}

/** Every thread in the database, a batch of questions at a time (for rebuilds). */
export async function* allThreadDocs(batch = 2000): AsyncGenerator<SearchDoc[]> {
  const { Question } = initModels();
  let after = 0;
  for (;;) {
    const ids = (
      await Question.findAll({
        attributes: ['id'],
        where: { id: { [Op.gt]: after } },
        order: [['id', 'ASC']],
        limit: batch,
        raw: true,
      })
    ).map((r) => r.id);
    const last = ids.at(-1);
    if (last === undefined) return;
    yield await threadDocs(ids);
    after = last;
  }
}
