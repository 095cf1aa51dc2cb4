import type { SearchKind } from '@/lib/search/documents';

/** How each kind of result is named on the page (DESIGN.md's names). */
export const KIND_LABEL: Record<SearchKind, string> = {
  guide: 'Guide',
  question: 'Question',
  answer: 'Answer',
  reply: 'Reply',
  'field-log': 'Field log',
};

export const KIND_FILTERS: { value: string; label: string }[] = [
  { value: '', label: 'Everything' },
  { value: 'guide', label: 'Guides' },
  { value: 'question', label: 'Questions' },
  { value: 'answer,reply', label: 'Answers and replies' },
  { value: 'field-log', label: 'Field logs' },
];
