/**
 * A rehype plugin, run after rehype-katex: a displayed formula wider than a phone scrolls
 * sideways inside its box, and a box that scrolls must be reachable from the keyboard
 * (WCAG 2.1.1; axe's scrollable-region-focusable), so each display gets a tab stop and a name.
 */
interface HastNode {
  type: string;
  tagName?: string;
  properties?: Record<string, unknown>;
  children?: HastNode[];
}

export function rehypeFocusableMath() {
  return (tree: HastNode) => {
    const walk = (node: HastNode) => {
      const cls = node.properties?.className;
      if (node.type === 'element' && Array.isArray(cls) && cls.includes('katex-display')) {
        node.properties = { ...node.properties, tabIndex: 0, role: 'group', ariaLabel: 'Formula (scrolls sideways)' };
        return;
      }
      node.children?.forEach(walk);
    };
    walk(tree);
  };
}
