import Link from 'next/link';
import { formatDate } from '@/lib/dates';

/** Who wrote a post, their expert label, and when. */
export function Byline({
  person,
  at,
  lead = false,
}: {
  person: { handle: string; displayName: string; expert: boolean };
  at: string;
  /** at the top of an answer: who answered is the first thing read, so a size up */
  lead?: boolean;
}) {
  return (
    <span className={`cw-muted ${lead ? 'text-sm' : 'text-xs'}`}>
      <Link href={`/people/${person.handle}`} className="cw-link">
        {person.displayName}
      </Link>
      {person.expert ? (
        <span className="ml-1 rounded bg-creek px-1.5 py-0.5 font-semibold text-limestone-50">expert</span>
      ) : null}{' '}
      · {formatDate(at)}
    </span>
  );
}
