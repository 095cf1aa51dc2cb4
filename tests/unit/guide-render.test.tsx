import { describe, expect, it } from 'vitest';
import { renderToStaticMarkup } from 'react-dom/server';
import { renderGuide } from '@/components/guides/GuideBody';
import { listGuides } from '@/lib/guides/content';

describe('guide rendering', () => {
  it('renders inline and display math with KaTeX, and collects headings for the contents', async () => {
    const { content, headings } = await renderGuide(
      '## How much water\n\nDelivery $q = \\eta Q H / h$.\n\n$$\nq = 0.6 \\times 7.57 \\times \\frac{4}{29}\n$$\n\n### A smaller heading\n\nText.\n',
    );
    const html = renderToStaticMarkup(content);
    expect(html).toContain('class="katex"');
    expect(html).toContain('katex-display');
    expect(html).toMatch(/<annotation encoding="application\/x-tex">q = \\eta Q H \/ h<\/annotation>/);
    expect(headings).toEqual([
      { depth: 2, id: 'how-much-water', text: 'How much water' },
      { depth: 3, id: 'a-smaller-heading', text: 'A smaller heading' },
    ]);
  });

  it('marks TeX that does not parse as an error, so the guide check below can catch it', async () => {
    const { content } = await renderGuide('$$\n\\frac{1}{\n$$\n');
    expect(renderToStaticMarkup(content)).toContain('katex-error');
  });

  it('compiles every guide in content/guides, each with a caution and the calculators it declares', async () => {
    const guides = listGuides();
    expect(guides.length).toBe(13);
    for (const g of guides) {
      expect(g.body, g.slug).toMatch(/<Caution/);
      for (const id of g.meta.calculators) {
        const tag = id.replace(/(^|-)([a-z])/g, (_, __, c: string) => c.toUpperCase());
        expect(g.body, `${g.slug} uses ${tag}`).toContain(`<${tag}`);
      }
      const { content, headings } = await renderGuide(g.body);
      expect(headings.length, g.slug).toBeGreaterThan(2);
      const html = renderToStaticMarkup(content);
      expect(html, `${g.slug} has a formula KaTeX cannot read`).not.toContain('katex-error');
      // the server draws each card's shell; the live card replaces it once the page has hydrated
      for (const id of g.meta.calculators)
        expect(html, `${g.slug} renders its ${id} card`).toContain(`data-calculator-shell="${id}"`);
    }
  }, 60_000);
});
