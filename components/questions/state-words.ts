import type { QuestionStateKind } from '@/lib/vocabulary';

/** How a question's state reads in the lists and the "show" line (ours, not another site's). */
export const STATE_WORDS: Record<QuestionStateKind, string> = {
  waiting: 'waiting for a first answer',
  'worked-on': 'being worked on',
  fixed: 'fixed',
};
