import { compileMDX } from 'next-mdx-remote/rsc';
import remarkGfm from 'remark-gfm';
import remarkMath from 'remark-math';
import rehypeKatex from 'rehype-katex';
import rehypeSlug from 'rehype-slug';
import { rehypeCollectHeadings, type Heading } from '@/lib/guides/headings';
import { rehypeFocusableMath } from '@/lib/guides/focusable-math';
import { guideComponents } from './mdx-components';

/** Compiles a guide's MDX on the server (at build time for static pages). */
export async function renderGuide(body: string) {
  const headings: Heading[] = [];
  const { content } = await compileMDX({
    source: body,
    components: guideComponents,
    options: {
      parseFrontmatter: false,
      mdxOptions: {
        remarkPlugins: [remarkGfm, remarkMath],
        rehypePlugins: [
          rehypeSlug,
          [rehypeKatex, { throwOnError: true, strict: 'ignore' }],
          rehypeFocusableMath,
          rehypeCollectHeadings(headings),
        ],
      },
    },
  });
  return { content, headings };
}
