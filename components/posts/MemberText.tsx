import type { ComponentProps } from 'react';
import Markdown, { type Components, type UrlTransform } from 'react-markdown';
import rehypeKatex from 'rehype-katex';
import { rehypeFocusableMath } from '@/lib/guides/focusable-math';
import rehypeSanitize, { defaultSchema, type Options as SanitizeSchema } from 'rehype-sanitize';
import remarkGfm from 'remark-gfm';
import remarkMath from 'remark-math';

/**
 * The sanitizer's allow-list: GitHub's (rehype-sanitize's default) plus the classes
 * remark-math puts on math so rehype-katex, which runs after it, can find the TeX.
 * Member HTML never survives this; KaTeX's own markup is added afterwards and trusted.
 */
const MATH_CLASSES = ['math-inline', 'math-display'];
const memberSchema: SanitizeSchema = {
  ...defaultSchema,
  // The only ids are the footnotes' and remark-rehype has already prefixed them with
  // "user-content-" (raw HTML never gets this far); prefixing again breaks their links.
  clobber: [],
  attributes: {
    ...defaultSchema.attributes,
    code: [...(defaultSchema.attributes?.code ?? []), ['className', /^language-./, ...MATH_CLASSES]],
    span: [...(defaultSchema.attributes?.span ?? []), ['className', ...MATH_CLASSES]],
    div: [...(defaultSchema.attributes?.div ?? []), ['className', ...MATH_CLASSES]],
  },
};

const SAFE_PROTOCOLS = new Set(['http:', 'https:', 'mailto:']);

/**
 * Only web and mail links leave member text. Same-site paths ("/guides/the-drive-pipe")
 * and in-page fragments (GFM footnotes) stay too: they cannot carry a script.
 */
export const memberUrlTransform: UrlTransform = (url) => {
  const u = url.trim();
  if (u.startsWith('#')) return u;
  if (u.startsWith('/') && !u.startsWith('//') && !u.startsWith('/\\')) return u;
  try {
    return SAFE_PROTOCOLS.has(new URL(u).protocol) ? u : null;
  } catch {
    return null;
  }
};

const REL = 'nofollow ugc noopener';

function MemberLink({ href, children }: { href?: string; children?: ComponentProps<'a'>['children'] }) {
  if (!href) return <span>{children}</span>;
  // Fragments are footnotes within the post: no need to mark them as member links.
  return (
    <a href={href} rel={href.startsWith('#') ? undefined : REL} className="cw-link">
      {children}
    </a>
  );
}

const components: Components = {
  a: ({ href, children }) => <MemberLink href={href}>{children}</MemberLink>,
  // Photos are attached to a post, not embedded: an image in the text becomes a link named by its alt text.
  img: ({ src, alt }) => {
    const label = alt?.trim() || 'image';
    return typeof src === 'string' && src ? <MemberLink href={src}>{label}</MemberLink> : <span>{label}</span>;
  },
  ul: ({ children }) => <ul className="list-disc pl-6">{children}</ul>,
  ol: ({ children, start }) => (
    <ol className="list-decimal pl-6" start={start}>
      {children}
    </ol>
  ),
  blockquote: ({ children }) => (
    <blockquote className="border-l-4 border-limestone-300 pl-3 italic dark:border-creek-600">{children}</blockquote>
  ),
  table: ({ children }) => (
    <div className="overflow-x-auto">
      <table className="cw-num border-collapse font-sans text-sm">{children}</table>
    </div>
  ),
  th: ({ children, style }) => (
    <th style={style} className="border border-limestone-300 px-2 py-1 text-left dark:border-creek-600">
      {children}
    </th>
  ),
  td: ({ children, style }) => (
    <td style={style} className="border border-limestone-300 px-2 py-1 dark:border-creek-600">
      {children}
    </td>
  ),
  pre: ({ children }) => (
    <pre className="overflow-x-auto rounded-md bg-limestone-200 p-3 font-mono text-sm dark:bg-creek-800">
      {children}
    </pre>
  ),
};

/**
 * A member's Markdown (questions, answers, replies, previews): GFM and TeX math,
 * sanitized, raw HTML shown as text, never compiled as MDX. Safe on the server and
 * in the browser (the ask form's live preview uses it too).
 */
export function MemberText({ children }: { children: string }) {
  return (
    <div className="cw-prose member-text">
      <Markdown
        remarkPlugins={[remarkGfm, remarkMath]}
        // sanitize first, then typeset: KaTeX's markup is ours, the member's HTML is not
        rehypePlugins={[
          [rehypeSanitize, memberSchema],
          // a member's TeX that does not parse shows as its source in the text colour (KaTeX's red fails contrast in dark mode)
          [rehypeKatex, { throwOnError: false, strict: 'ignore', trust: false, errorColor: 'currentColor' }],
          rehypeFocusableMath,
        ]}
        urlTransform={memberUrlTransform}
        components={components}
      >
        {children}
      </Markdown>
    </div>
  );
}
