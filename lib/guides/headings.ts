/**
 * A rehype plugin that records the h2/h3 headings (after rehype-slug gave them ids)
 * into the array it is given, so the page can draw a table of contents from the
 * very tree it renders.
 */
export interface Heading {
  depth: 2 | 3;
  id: string;
  text: string;
}

interface HastNode {
  type: string;
  tagName?: string;
  value?: string;
  properties?: Record<string, unknown>;
  children?: HastNode[];
}

function textOf(node: HastNode): string {
  if (node.type === 'text') return node.value ?? '';
  // KaTeX output carries a MathML copy and an HTML copy; read the TeX annotation only.
  if (node.tagName === 'annotation') return node.children?.map(textOf).join('') ?? '';
  if (node.properties && Array.isArray(node.properties.className) && node.properties.className.includes('katex-html'))
    return '';
  return (node.children ?? []).map(textOf).join('');
}

export function rehypeCollectHeadings(out: Heading[]) {
  return () => (tree: HastNode) => {
    const walk = (node: HastNode) => {
      if (node.type === 'element' && (node.tagName === 'h2' || node.tagName === 'h3')) {
        const id = node.properties?.id;
        if (typeof id === 'string') out.push({ depth: node.tagName === 'h2' ? 2 : 3, id, text: textOf(node).trim() });
        return;
      }
      node.children?.forEach(walk);
    };
    walk(tree);
  };
}
