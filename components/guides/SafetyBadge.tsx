import type { SafetyState } from '@/lib/guides/safety';

/**
 * Each state's words and colours: sound in moss, anything a reader should be wary of in
 * the caution amber, with the caution symbol, and "not yet checked" plain. The words say
 * the verdict, so the colour is never the only thing that tells them apart.
 * tests/unit/safety-badge.test.ts holds every pair to 4.5:1 in both themes.
 */
export const SAFETY_LOOK: Record<SafetyState, { words: string; classes: string; caution: boolean }> = {
  checked: {
    words: 'Safety checked',
    classes: 'bg-moss-600 text-limestone-50 dark:bg-moss-300 dark:text-creek-950',
    caution: false,
  },
  'needs changes': {
    words: 'Safety check: needs changes',
    classes: 'border border-signal-700 bg-signal-100 text-signal-900 dark:bg-signal-800 dark:text-signal-100',
    caution: true,
  },
  changed: {
    words: 'Changed since its last safety check',
    classes: 'bg-signal-300 text-creek-950 dark:bg-signal-300 dark:text-creek-950',
    caution: true,
  },
  'not checked': {
    words: 'Not yet checked',
    classes: 'border border-creek-300 bg-limestone-50 text-creek-800 dark:bg-creek-900 dark:text-limestone-100',
    caution: false,
  },
};

export function SafetyBadge({ state, className = '' }: { state: SafetyState; className?: string }) {
  const look = SAFETY_LOOK[state];
  return (
    <span
      data-safety-state={state}
      className={`inline-flex items-center gap-1 rounded px-2 py-0.5 font-sans font-semibold ${look.classes} ${className}`}
    >
      {look.caution ? <span aria-hidden="true">⚠</span> : null}
      {look.words}
    </span>
  );
}
