import { diffWords, type Change } from 'diff';

/**
 * What an edit changed, word by word: added words in moss, removed words in clay and
 * struck through. Screen readers hear "added" and "removed" around each change, since
 * colour and strike-through say nothing to them.
 */
export function RevisionDiff({
  before,
  after,
  label = 'Changes in this revision',
}: {
  before: string;
  after: string;
  label?: string;
}) {
  const changes = diffWords(before, after);
  const unchanged = changes.every((c) => !c.added && !c.removed);
  return (
    <div
      className="cw-prose whitespace-pre-wrap break-words"
      role="group"
      aria-label={label}
      data-testid="revision-diff"
    >
      {unchanged ? <p className="cw-muted font-sans text-sm">No changes to the text.</p> : null}
      {changes.map((c, i) =>
        c.added || c.removed ? <ChangeMark key={i} change={c} /> : <span key={i}>{c.value}</span>,
      )}
    </div>
  );
}

/** One added or removed run of words: moss for added, clay struck through for removed, spoken as such. */
export function ChangeMark({ change: c }: { change: Change }) {
  return c.added ? (
    <ins className="rounded-sm bg-moss-100 text-moss-700 no-underline dark:bg-moss-700 dark:text-moss-100">
      <span className="sr-only">[added: </span>
      {c.value}
      <span className="sr-only">]</span>
    </ins>
  ) : (
    <del className="rounded-sm bg-clay-200 text-clay-700 line-through dark:bg-clay-700 dark:text-clay-200">
      <span className="sr-only">[removed: </span>
      {c.value}
      <span className="sr-only">]</span>
    </del>
  );
}
