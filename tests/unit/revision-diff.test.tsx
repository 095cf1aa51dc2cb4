import { describe, expect, it } from 'vitest';
import { renderToStaticMarkup } from 'react-dom/server';
import { RevisionDiff } from '@/components/posts/RevisionDiff';

const html = (before: string, after: string) => renderToStaticMarkup(<RevisionDiff before={before} after={after} />);

describe('RevisionDiff', () => {
  it('marks an inserted word in moss with screen-reader text', () => {
    const out = html('The ram stops.', 'The ram stops cycling.');
    expect(out).toMatch(
      /<ins class="[^"]*moss[^"]*"><span class="sr-only">\[added: <\/span>\s*cycling<span class="sr-only">\]<\/span><\/ins>/,
    );
    expect(out).not.toContain('<del');
  });

  it('marks a deleted word in clay, struck through, with screen-reader text', () => {
    const out = html('Drive pipe is flexible HDPE.', 'Drive pipe is HDPE.');
    expect(out).toMatch(
      /<del class="[^"]*clay[^"]*line-through[^"]*"><span class="sr-only">\[removed: <\/span>flexible/,
    );
    expect(out).not.toContain('<ins');
  });

  it('shows a replaced word as a deletion and an insertion, keeping the rest', () => {
    const out = html('Fall is 4 ft.', 'Fall is 5 ft.');
    expect(out).toMatch(/<del[^>]*>.*4.*<\/del>/);
    expect(out).toMatch(/<ins[^>]*>.*5.*<\/ins>/);
    expect(out).toContain('Fall is ');
  });

  it('escapes the text rather than rendering it as HTML', () => {
    const out = html('a', 'a <script>alert(1)</script>');
    expect(out).not.toContain('<script');
    expect(out).toContain('&lt;script&gt;');
  });

  it('says so when nothing changed', () => {
    expect(html('same words', 'same words')).toContain('No changes to the text.');
  });
});
