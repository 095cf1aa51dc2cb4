import { readdirSync } from 'node:fs';
import path from 'node:path';

/** Every guide's slug, from the MDX files the site is built from. */
export function guideSlugs(): string[] {
  return readdirSync(path.join(process.cwd(), 'content/guides'))
    .filter((f) => f.endsWith('.mdx'))
    .map((f) => f.replace(/\.mdx$/, ''))
    .sort();
}
