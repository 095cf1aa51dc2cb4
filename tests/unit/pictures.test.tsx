import { describe, expect, it } from 'vitest';
import { renderToStaticMarkup } from 'react-dom/server';
import { renderGuide } from '@/components/guides/GuideBody';
import { readGuideFile } from '@/lib/guides/content';

const PARTS = ['drive pipe', 'waste valve', 'delivery valve', 'air chamber', 'snifter', 'delivery line'];

describe('the ram diagram in "How a ram pump works"', () => {
  it('draws the parts and the four phases of a beat, each beside its steps, labelled in words', async () => {
    const guide = readGuideFile('how-a-ram-pump-works');
    if (!guide) throw new Error('guide missing');
    const html = renderToStaticMarkup((await renderGuide(guide.body)).content);
    const figures = [...html.matchAll(/<figure[^>]*data-ram-diagram="([^"]+)"[\s\S]*?<\/figure>/g)];
    expect(figures.map((f) => f[1])).toEqual(['parts', '1', '2', '3', '4']);
    for (const [figure, phase] of figures) {
      expect(figure, phase).toMatch(/<svg[^>]*role="img"[^>]*aria-labelledby="ram-[\w]+-title ram-[\w]+-desc"/);
      expect(figure, phase).toMatch(
        /<title id="ram-[\w]+-title">[^<]+<\/title><desc id="ram-[\w]+-desc">[^<]+<\/desc>/,
      );
      // each part labelled in the drawing's own text, so nothing is told by colour alone
      // (the valve's label wraps onto two lines)
      const labels = [...figure.matchAll(/<text[^>]*>([^<]*)<\/text>/g)].map((t) => t[1]!.trim()).join(' ');
      for (const part of PARTS) expect(labels, `${phase} labels ${part}`).toContain(part);
    }
    // each phase comes after the step it draws and before the next step's heading
    const at = (s: string) => html.indexOf(s);
    expect(at('data-ram-diagram="parts"')).toBeLessThan(at('id="one-beat-step-by-step"'));
    expect(at('data-ram-diagram="1"')).toBeGreaterThan(at('id="1-drive-water-accelerates"'));
    expect(at('data-ram-diagram="1"')).toBeLessThan(at('id="2-the-waste-valve-slams-shut"'));
    expect(at('data-ram-diagram="2"')).toBeLessThan(at('id="3-pressure-rises"'));
    expect(at('data-ram-diagram="3"')).toBeGreaterThan(at('id="4-the-delivery-valve-opens"'));
    expect(at('data-ram-diagram="4"')).toBeGreaterThan(at('id="8-the-waste-valve-reopens"'));
    expect(at('data-ram-diagram="4"')).toBeLessThan(at('id="beats-per-minute-and-stroke"'));
  });
});
