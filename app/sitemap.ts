import type { MetadataRoute } from 'next';
import { siteUrl } from '@/lib/site';

const STATIC_PATHS = ['/', '/guides', '/calculators', '/questions', '/field-log', '/safety'];

export default function sitemap(): MetadataRoute.Sitemap {
  const base = siteUrl();
  return STATIC_PATHS.map((p) => ({ url: `${base}${p}`, changeFrequency: 'weekly', priority: p === '/' ? 1 : 0.7 }));
}
