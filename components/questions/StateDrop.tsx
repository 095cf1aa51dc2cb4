import type { QuestionStateKind } from '@/lib/vocabulary';

/** A drop that fills as a question moves on: empty while waiting, half while worked on, full when fixed. */
export function StateDrop({ kind, className = '' }: { kind: QuestionStateKind; className?: string }) {
  return (
    <svg viewBox="0 0 16 16" aria-hidden="true" className={`inline-block h-4 w-4 flex-none ${className}`}>
      {kind === 'worked-on' ? <path d="M3 10.2a5 5 0 0 0 10 0z" fill="currentColor" /> : null}
      <path
        d="M8 1.5C8 1.5 3 7.2 3 10.2a5 5 0 0 0 10 0C13 7.2 8 1.5 8 1.5z"
        fill={kind === 'fixed' ? 'currentColor' : 'none'}
        stroke="currentColor"
        strokeWidth="1.4"
        strokeLinejoin="round"
      />
    </svg>
  );
}
