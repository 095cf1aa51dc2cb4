import { describe, expect, it } from 'vitest';
import { renderToStaticMarkup } from 'react-dom/server';
import { MemberText, memberUrlTransform } from '@/components/posts/MemberText';

const html = (md: string) => renderToStaticMarkup(<MemberText>{md}</MemberText>);

describe('MemberText', () => {
  it('wraps member text in the reading style', () => {
    expect(html('Hello')).toMatch(/^<div class="cw-prose member-text">/);
  });

  it('renders no script element from raw HTML', () => {
    const out = html('Before <script>alert(1)</script> after');
    expect(out).not.toMatch(/<script/i);
  });

  it('drops javascript: links', () => {
    const out = html('[x](javascript:alert(1))');
    expect(out).not.toMatch(/href="javascript:/i);
    expect(out).not.toMatch(/javascript:/i);
    expect(
      memberUrlTransform('JavaScript:alert(1)', 'href', {
        type: 'element',
        tagName: 'a',
        properties: {},
        children: [],
      }),
    ).toBeNull();
  });

  it('gives no img element and no onerror attribute from raw HTML', () => {
    const out = html('<img src=x onerror=alert(1)>');
    expect(out).not.toMatch(/<img/i);
    expect(out).not.toMatch(/<[^>]*\sonerror=/i);
  });

  it('turns a Markdown image into a link named by its alt text', () => {
    const out = html('![the waste valve](https://example.org/valve.jpg)');
    expect(out).not.toMatch(/<img/i);
    expect(out).toContain(
      '<a href="https://example.org/valve.jpg" rel="nofollow ugc noopener" class="cw-link">the waste valve</a>',
    );
  });

  it('typesets TeX math with KaTeX', () => {
    const out = html('The yield is $q = \\eta Q H / h$ for a ram.');
    expect(out).toContain('class="katex"');
    expect(html('$$\nq = \\eta Q H / h\n$$')).toContain('katex-display');
  });

  it('marks links nofollow ugc and sets no target', () => {
    const out = html('[the guide](https://clackwater.example/guides/the-drive-pipe)');
    expect(out).toMatch(/rel="nofollow ugc noopener"/);
    expect(out).not.toMatch(/target=/);
  });

  it('keeps mailto and same-site links, drops data: links', () => {
    expect(html('[mail](mailto:a@example.org)')).toContain('href="mailto:a@example.org"');
    expect(html('[guide](/guides/the-drive-pipe)')).toContain('href="/guides/the-drive-pipe"');
    expect(html('[x](data:text/html,hi)')).not.toContain('data:');
  });

  it('renders a GFM table', () => {
    const out = html('| fall | lift |\n| --- | --- |\n| 4 ft | 29 ft |');
    expect(out).toContain('<table');
    expect(out).toContain('<td');
  });

  it('renders bold', () => {
    expect(html('**bold**')).toContain('<strong>bold</strong>');
  });
});

describe('MemberText footnotes', () => {
  it('links a footnote to its note (ids prefixed once)', () => {
    const out = html('See the note[^1].\n\n[^1]: measured in the dry month');
    expect(out).toContain('href="#user-content-fn-1"');
    expect(out).toContain('id="user-content-fn-1"');
  });
});
