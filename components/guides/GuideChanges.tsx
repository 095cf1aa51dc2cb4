import { diffWords, type Change } from 'diff';

/** Unchanged text longer than this is cut to its ends, so a phone shows the changes, not the whole guide. */
const KEEP = 160;

function trimmed(value: string, first: boolean, last: boolean): string {
  if (value.length <= KEEP * 2 + 40) return value;
  const head = first ? '' : value.slice(0, KEEP);
  const tail = last ? '' : value.slice(-KEEP);
  return `${head}${head ? ' ' : ''}[…]${tail ? ' ' : ''}${tail}`;
}

/**
 * What changed in a guide since a check, word by word, drawn as components/posts/RevisionDiff
 * draws an edit (moss for added, clay struck through for removed, spoken as "added"/"removed"),
 * with long unchanged stretches cut down to the words around each change.
 */
export function GuideChanges({ before, after }: { before: string; after: string }) {
  const changes: Change[] = diffWords(before, after);
  const unchanged = changes.every((c) => !c.added && !c.removed);
  if (unchanged) return <p className="cw-muted font-sans text-sm">The text has not changed since this check.</p>;
  return (
    <div
      className="cw-prose whitespace-pre-wrap break-words"
      role="group"
      aria-label="Changes since the safety check"
      data-testid="revision-diff"
    >
      {changes.map((c, i) =>
        c.added ? (
          <ins
            key={i}
            className="rounded-sm bg-moss-100 text-moss-700 no-underline dark:bg-moss-700 dark:text-moss-100"
          >
            <span className="sr-only">[added: </span>
            {c.value}
            <span className="sr-only">]</span>
          </ins>
        ) : c.removed ? (
          <del
            key={i}
            className="rounded-sm bg-clay-200 text-clay-700 line-through dark:bg-clay-700 dark:text-clay-200"
          >
            <span className="sr-only">[removed: </span>
            {c.value}
            <span className="sr-only">]</span>
          </del>
        ) : (
          <span key={i} className="cw-muted">
            {trimmed(c.value, i === 0, i === changes.length - 1)}
          </span>
        ),
      )}
    </div>
  );
}
