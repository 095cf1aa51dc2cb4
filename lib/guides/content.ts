import { createHash } from 'node:crypto';
import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import matter from 'gray-matter';
import { guideFrontmatterSchema, type GuideFrontmatter } from './frontmatter';

/** Where the guides live; GUIDES_DIR overrides it for tests. */
export function guidesDir(): string {
  return process.env.GUIDES_DIR ?? path.join(process.cwd(), 'content', 'guides');
}

export interface GuideFile {
  slug: string;
  meta: GuideFrontmatter;
  /** MDX body without the frontmatter and without editors' comments: what the page and search see. */
  body: string;
  /** MDX body with the editors' `{/* check: ... *\/}` comments the guides-agree test reads. */
  source: string;
  /** The whole file as read: a safety check keeps it, to show later what changed. */
  raw: string;
  /** sha256 of the whole file: a safety check is tied to exactly this text. */
  hash: string;
}

/** The content hash a safety check records: sha256 over the file's bytes, hex. */
export function contentHash(fileText: string | Buffer): string {
  return createHash('sha256').update(fileText).digest('hex');
}

export function readGuideFile(slug: string, dir = guidesDir()): GuideFile | null {
  if (!/^[a-z0-9-]+$/.test(slug)) return null;
  let raw: string;
  try {
    raw = readFileSync(/* turbopackIgnore: true */ path.join(dir, `${slug}.mdx`), 'utf8');
  } catch {
    return null;
  }
  const parsed = matter(raw);
  const meta = guideFrontmatterSchema.safeParse(parsed.data);
  if (!meta.success) {
    const issue = meta.error.issues[0];
    throw new Error(`content/guides/${slug}.mdx: frontmatter ${issue?.path.join('.')}: ${issue?.message}`);
  }
  return {
    slug,
    meta: meta.data,
    body: stripEditorComments(parsed.content),
    source: parsed.content,
    raw,
    hash: contentHash(raw),
  };
}

/**
 * Drops MDX comments (`{/* ... *\/}`): the worked-example checks are for the test, not
 * for readers, and search would otherwise index their engine names and props as words.
 */
export function stripEditorComments(mdx: string): string {
  return mdx.replace(/\n?[ \t]*\{\/\*[\s\S]*?\*\/\}[ \t]*\n?/g, '\n');
}

/** Every guide in reading order (frontmatter `order`, then title). */
export function listGuides(dir = guidesDir()): GuideFile[] {
  let files: string[];
  try {
    files = readdirSync(/* turbopackIgnore: true */ dir).filter((f) => f.endsWith('.mdx'));
  } catch {
    return [];
  }
  return files
    .map((f) => readGuideFile(f.replace(/\.mdx$/, ''), dir))
    .filter((g): g is GuideFile => g !== null)
    .sort((a, b) => a.meta.order - b.meta.order || a.meta.title.localeCompare(b.meta.title));
}

export function neighbours(slug: string, guides = listGuides()) {
  const i = guides.findIndex((g) => g.slug === slug);
  return { previous: i > 0 ? guides[i - 1] : null, next: i >= 0 && i < guides.length - 1 ? guides[i + 1] : null };
}
