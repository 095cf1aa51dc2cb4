import { describe, expect, it } from 'vitest';
import { renderToStaticMarkup } from 'react-dom/server';
import { MemberText } from '@/components/posts/MemberText';
import { renderGuide } from '@/components/guides/GuideBody';

/** A formula that scrolls sideways must take keyboard focus (axe: scrollable-region-focusable). */
describe('displayed formulas are keyboard-reachable', () => {
  it('in a member post', () => {
    const html = renderToStaticMarkup(<MemberText>{'$$\nq = \\eta Q \\frac{H}{h}\n$$'}</MemberText>);
    expect(html).toMatch(/<span[^>]*class="katex-display"[^>]*tabindex="0"|tabindex="0"[^>]*class="katex-display"/);
  });

  it('in a guide', async () => {
    const { content } = await renderGuide('Text.\n\n$$\nq = \\eta Q \\frac{H}{h}\n$$\n');
    const html = renderToStaticMarkup(content);
    expect(html).toMatch(/class="katex-display"[^>]*tabindex="0"|tabindex="0"[^>]*class="katex-display"/);
    expect(html).toContain('aria-label="Formula (scrolls sideways)"');
  });
});
