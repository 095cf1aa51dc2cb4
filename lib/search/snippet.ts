import { tokenize } from './normalize';

export interface Segment {
  text: string;
  hit: boolean;
}

/** Spans of the text whose tokens meet the query's terms. */
function hitSpans(text: string, terms: Set<string>) {
  return tokenize(text).filter((t) => terms.has(t.term) || t.near?.some((n) => terms.has(n)));
}

function cut(text: string, from: number, to: number, spans: { start: number; end: number }[]): Segment[] {
  const out: Segment[] = [];
  let at = from;
  for (const s of spans) {
    if (s.end <= from || s.start >= to) continue;
    const a = Math.max(s.start, from);
    const b = Math.min(s.end, to);
    if (a > at) out.push({ text: text.slice(at, a), hit: false });
    out.push({ text: text.slice(a, b), hit: true });
    at = b;
  }
  if (at < to) out.push({ text: text.slice(at, to), hit: false });
  return out;
}

/** The title with the matching words marked. */
export function highlight(text: string, terms: Set<string>): Segment[] {
  return cut(text, 0, text.length, hitSpans(text, terms));
}

/**
 * A window of about `width` characters where the query's terms are densest, cut at
 * word boundaries, the matches marked; the page renders marks, never HTML.
 */
export function snippet(text: string, terms: Set<string>, width = 200): Segment[] {
  const flat = text.replace(/\s+/g, ' ').trim();
  const spans = hitSpans(flat, terms);
  // two pointers over the hits: the window of `width` characters with the most distinct hit words
  let best = 0;
  let bestCount = 0;
  const inWindow = new Map<string, number>();
  const word = (s: { start: number; end: number }) => flat.slice(s.start, s.end).toLowerCase();
  let j = 0;
  for (const [i, span] of spans.entries()) {
    for (let next = spans[j]; next && next.end - span.start <= width; next = spans[++j]) {
      const w = word(next);
      inWindow.set(w, (inWindow.get(w) ?? 0) + 1);
    }
    if (inWindow.size > bestCount) {
      bestCount = inWindow.size;
      best = span.start;
    }
    if (j > i) {
      const w = word(span);
      const c = inWindow.get(w)! - 1;
      if (c === 0) inWindow.delete(w);
      else inWindow.set(w, c);
    }
  }
  let from = Math.max(0, best - Math.floor(width / 4));
  if (from > 0) {
    const space = flat.indexOf(' ', from);
    from = space >= 0 && space < best ? space + 1 : from;
  }
  let to = Math.min(flat.length, from + width);
  if (to < flat.length) {
    const space = flat.lastIndexOf(' ', to);
    if (space > from) to = space;
  }
  const segments = cut(flat, from, to, spans);
  if (from > 0) segments.unshift({ text: '… ', hit: false });
  if (to < flat.length) segments.push({ text: ' …', hit: false });
  return segments;
}
