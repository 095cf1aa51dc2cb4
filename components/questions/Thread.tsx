'use client';

import Link from 'next/link';
import { useEffect, useRef, useState } from 'react';
import useSWR from 'swr';
import { useSession } from 'next-auth/react';
import { MemberText } from '@/components/posts/MemberText';
import { CalculatorById } from '@/components/calculators/Calculators';
import { can } from '@/lib/auth/policy';
import type { AnswerView, ReplyView, ThreadView } from '@/lib/questions/thread';
import { getCalculator } from '@/lib/calculators';
import { PhotoGallery } from '@/components/photos/PhotoGallery';
import { EditBody, HelpfulButton, RevisionHistory } from './PostControls';
import { AnswerComposer, ReplyComposer } from './AnswerComposer';
import { getJson, sendJson } from '@/components/forms/api';
import { FlagButton } from '@/components/moderation/FlagButton';
import { PostMarks } from '@/components/moderation/PostMarks';
import { ChooseFix } from './FixedIt';
import { StateDrop } from './StateDrop';
import { Byline } from './Byline';
import { signInPath } from '@/lib/auth/return-path';

type Viewer = { id: number; handle: string; role: 'member' | 'expert' | 'moderator' | 'admin' } | null;

/** The signed-in reader from the session (null while it loads, and when signed out). */
export function useViewer(): Viewer {
  const { data } = useSession();
  const u = data?.user as { id?: number; handle?: string; role?: string } | undefined;
  if (!u?.id || !u.handle || !u.role) return null;
  return { id: u.id, handle: u.handle, role: u.role as NonNullable<Viewer>['role'] };
}
/**
 * The live part of a thread page. The server draws it first; after that SWR keeps
 * it current, and every action (answer, reply, helpful, fixed it, follow) goes
 * through the route handlers and refreshes it — marks change at once (optimistic).
 */
export function Thread({ initial }: { initial: ThreadView }) {
  const key = `/api/questions/${initial.id}`;
  const viewer = useViewer();
  // The page arrives as every signed-out reader sees it; a signed-in reader's own
  // marks and follows (and, for moderators, hidden posts) are fetched once the session is known.
  const { data, mutate } = useSWR<ThreadView>(viewer ? key : null, getJson<ThreadView>, {
    fallbackData: initial,
    revalidateOnMount: true,
    revalidateOnFocus: false,
  });
  const t = data ?? initial;
  const refresh = () => void mutate();
  const isAsker = can(viewer, 'question.markFixed', t.author.id);
  const optimistic = (patch: (v: ThreadView) => ThreadView) => (_: unknown, settle: Promise<unknown>) => {
    void mutate(patch(t), { revalidate: false });
    void settle.then(() => mutate());
  };

  // the answer just posted: marked, and focused once it is drawn (far above the form on a phone)
  const [posted, setPosted] = useState<number | null>(null);
  const focused = useRef<number | null>(null);
  useEffect(() => {
    if (posted === null || focused.current === posted) return;
    const el = document.getElementById(`answer-${posted}`);
    if (!el) return;
    el.focus();
    focused.current = posted;
  }, [posted, t.answers]);

  const repliesUnder = (answerId: number | null) => t.replies.filter((r) => r.answerId === answerId);

  return (
    <div className="flex flex-col gap-6">
      {t.lockedAt ? (
        <p role="status" className="cw-card font-sans text-sm font-semibold">
          This thread is locked: it takes no new answers or replies.
        </p>
      ) : null}
      <section aria-label="The question" className="flex flex-col gap-3">
        <PostMarks post={t} kind="question" />
        {t.site ? (
          <p className="font-sans text-sm" data-testid="thread-site">
            About the site{' '}
            <Link href={`/sites/${t.site.id}`} className="cw-link font-semibold">
              {t.site.name}
            </Link>
          </p>
        ) : null}
        <MemberText>{t.body}</MemberText>
        {t.photos.length ? <PhotoGallery photos={t.photos} canFlag={!!viewer && viewer.id !== t.author.id} /> : null}
        <div className="flex flex-wrap items-center gap-3">
          <Byline person={t.author} at={t.createdAt} />
          <HelpfulButton
            postType="question"
            postId={t.id}
            count={t.helpfulCount}
            marked={t.markedByViewer}
            disabled={!viewer || viewer.id === t.author.id}
            onChanged={(o, settle) =>
              optimistic((v) => ({ ...v, helpfulCount: o.count, markedByViewer: o.marked }))(o, settle)
            }
          />
          {viewer ? (
            <button
              type="button"
              className="cw-link text-xs"
              onClick={async () => {
                await sendJson(`${key}/follow`, t.followedByViewer ? 'DELETE' : 'POST');
                refresh();
              }}
            >
              {t.followedByViewer ? 'Following · stop' : 'Follow this question'}
            </button>
          ) : null}
          {can(viewer, 'question.edit', t.author.id) ? (
            <EditBody
              url={key}
              initial={t.body}
              onSaved={refresh}
              extra={{ title: t.title, tags: t.tags.map((x) => x.slug), siteSheet: t.siteSheet ?? undefined }}
            />
          ) : null}
          {t.edited ? <RevisionHistory questionId={t.id} postType="question" postId={t.id} /> : null}
          {viewer && viewer.id !== t.author.id ? (
            <FlagButton postType="question" postId={t.id} onFlagged={refresh} />
          ) : null}
        </div>
        <Replies
          items={repliesUnder(null)}
          viewer={viewer}
          locked={!!t.lockedAt}
          questionId={t.id}
          answerId={null}
          onChange={refresh}
        />
        {viewer && !t.lockedAt ? (
          <ReplyComposer questionId={t.id} onPosted={refresh} label="Reply to the question" />
        ) : null}
      </section>

      <section aria-label="Answers" className="flex flex-col gap-4">
        <h2 className="font-serif text-2xl font-semibold">
          {t.answers.length} {t.answers.length === 1 ? 'answer' : 'answers'}
        </h2>
        {t.answers.map((a) => (
          <Answer
            key={a.id}
            a={a}
            t={t}
            viewer={viewer}
            isAsker={isAsker}
            onChange={refresh}
            replies={repliesUnder(a.id)}
            optimistic={optimistic}
            justPosted={a.id === posted}
          />
        ))}
      </section>

      {t.lockedAt ? null : viewer ? (
        <AnswerComposer
          questionId={t.id}
          siteSheet={t.siteSheet}
          onPosted={(answerId) => {
            setPosted(answerId);
            refresh();
          }}
        />
      ) : (
        <p className="cw-card">
          <Link href={signInPath(`/questions/${t.id}`)} className="cw-link">
            Sign in
          </Link>{' '}
          to answer or reply.
        </p>
      )}
    </div>
  );
}

function Answer({
  a,
  t,
  viewer,
  isAsker,
  onChange,
  replies,
  optimistic,
  justPosted,
}: {
  a: AnswerView;
  t: ThreadView;
  viewer: Viewer;
  isAsker: boolean;
  onChange: () => void;
  replies: ReplyView[];
  optimistic: (patch: (v: ThreadView) => ThreadView) => (o: unknown, settle: Promise<unknown>) => void;
  justPosted: boolean;
}) {
  return (
    <article
      className="cw-card flex flex-col gap-3"
      data-answer={a.id}
      data-fixed={a.fixed || undefined}
      id={`answer-${a.id}`}
      tabIndex={-1}
      aria-label={`Answer by ${a.author.displayName}`}
    >
      {a.fixed ? (
        <p className="-mx-4 -mt-4 flex items-center gap-2 rounded-t-lg bg-moss-100 px-4 py-1.5 text-sm text-moss-700 dark:bg-moss-700 dark:text-moss-100">
          <StateDrop kind="fixed" />
          <span>
            <span className="font-semibold">What fixed it</span> · chosen by {t.author.displayName}, who asked
          </span>
        </p>
      ) : null}
      <header className="flex flex-wrap items-center gap-2" data-testid="answer-byline">
        <Byline person={a.author} at={a.createdAt} lead />
        {justPosted ? (
          <span className="text-sm font-semibold text-moss-600 dark:text-moss-300">· Posted just now</span>
        ) : null}
      </header>
      <PostMarks post={a} kind="answer" />
      <MemberText>{a.body}</MemberText>
      {a.photos.length ? (
        <PhotoGallery photos={a.photos} canFlag={!!viewer && viewer.handle !== a.author.handle} />
      ) : null}
      {a.calculation ? (
        <div className="flex flex-col gap-1" data-testid="answer-calculation">
          <p className="text-sm font-semibold">
            Worked calculation: {getCalculator(a.calculation.tool)?.name ?? a.calculation.tool} —{' '}
            <Link href={`/calculations/${a.calculation.id}`} className="cw-link">
              permalink
            </Link>
          </p>
          <p className="cw-muted text-xs">Try with my numbers: change any input below; your copy is yours alone.</p>
          <CalculatorById id={a.calculation.tool} props={a.calculation.inputs} />
        </div>
      ) : null}
      <div className="flex flex-wrap items-center gap-3">
        <HelpfulButton
          postType="answer"
          postId={a.id}
          count={a.helpfulCount}
          marked={a.markedByViewer}
          disabled={!viewer || viewer.handle === a.author.handle}
          onChanged={(o, settle) =>
            optimistic((v) => ({
              ...v,
              answers: v.answers.map((x) =>
                x.id === a.id ? { ...x, helpfulCount: o.count, markedByViewer: o.marked } : x,
              ),
            }))(o, settle)
          }
        />
        {isAsker ? (
          <ChooseFix questionId={t.id} answerId={a.id} fixed={a.fixed} line={t.whatFixedIt} onChange={onChange} />
        ) : null}
        {can(viewer, 'answer.edit', viewer && a.author.handle === viewer.handle ? viewer.id : -1) ? (
          <EditBody url={`/api/answers/${a.id}`} initial={a.body} onSaved={onChange} />
        ) : null}
        {a.edited ? <RevisionHistory questionId={t.id} postType="answer" postId={a.id} /> : null}
        {viewer && viewer.handle !== a.author.handle ? (
          <FlagButton postType="answer" postId={a.id} onFlagged={onChange} />
        ) : null}
      </div>
      <Replies
        items={replies}
        viewer={viewer}
        locked={!!t.lockedAt}
        questionId={t.id}
        answerId={a.id}
        onChange={onChange}
      />
      {viewer && !t.lockedAt ? (
        <ReplyComposer questionId={t.id} answerId={a.id} onPosted={onChange} label="Reply to this answer" />
      ) : null}
    </article>
  );
}

function Replies({
  items,
  viewer,
  locked,
  questionId,
  answerId,
  onChange,
}: {
  items: ReplyView[];
  viewer: Viewer;
  locked: boolean;
  questionId: number;
  answerId: number | null;
  onChange: () => void;
}) {
  const children = (parent: number | null) => items.filter((r) => r.replyToId === parent);
  const render = (parent: number | null) => {
    const list = children(parent);
    if (!list.length) return null;
    return (
      <ul
        className={`flex flex-col gap-2 ${parent === null ? '' : 'ml-4 border-l border-limestone-300 pl-3 dark:border-creek-600'}`}
      >
        {list.map((r) => (
          <li key={r.id} id={`reply-${r.id}`} data-reply={r.id} data-depth={r.depth} className="text-sm">
            <PostMarks post={r} kind="reply" />
            <MemberText>{r.body}</MemberText>
            <div className="flex flex-wrap items-center gap-3">
              <Byline person={r.author} at={r.createdAt} />
              {viewer && viewer.handle === r.author.handle ? (
                <EditBody url={`/api/replies/${r.id}`} initial={r.body} onSaved={onChange} />
              ) : null}
              {viewer && !locked ? (
                <ReplyComposer questionId={questionId} answerId={answerId} replyToId={r.id} onPosted={onChange} />
              ) : null}
              {r.edited ? <RevisionHistory questionId={questionId} postType="reply" postId={r.id} /> : null}
              {viewer && viewer.handle !== r.author.handle ? (
                <FlagButton postType="reply" postId={r.id} onFlagged={onChange} />
              ) : null}
            </div>
            {render(r.id)}
          </li>
        ))}
      </ul>
    );
  };
  return render(null);
}
