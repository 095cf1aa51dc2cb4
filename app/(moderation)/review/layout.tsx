import type { ReactNode } from 'react';
// Flagged posts are shown as their readers see them, math included: without KaTeX's
// stylesheet each formula would print twice (its MathML copy and its drawing).
import 'katex/dist/katex.min.css';

export default function ReviewLayout({ children }: { children: ReactNode }) {
  return children;
}
