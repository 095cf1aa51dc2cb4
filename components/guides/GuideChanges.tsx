import { diffWords, type Change } from 'diff';
import { ChangeMark } from '@/components/posts/RevisionDiff';

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
        c.added || c.removed ? (
          <ChangeMark key={i} change={c} />
        ) : (
          <span key={i} className="cw-muted">
            {trimmed(c.value, i === 0, i === changes.length - 1)}
          </span>
        ),
      )}
    </div>
  );
}
