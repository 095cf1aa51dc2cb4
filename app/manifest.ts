import type { MetadataRoute } from 'next';
import { palette } from '@/tailwind.config';
import { SITE_DESCRIPTION, SITE_NAME } from '@/lib/site';

/** Installs as the field kit: the screens a member needs at the water open first. */
export default function manifest(): MetadataRoute.Manifest {
  return {
    id: '/field-kit',
    name: SITE_NAME,
    short_name: SITE_NAME,
    description: SITE_DESCRIPTION,
    start_url: '/field-kit',
    scope: '/',
    display: 'standalone',
    theme_color: palette.creek.DEFAULT,
    background_color: palette.limestone.DEFAULT,
    icons: [
      { src: '/icons/icon-192.png', sizes: '192x192', type: 'image/png', purpose: 'any' },
      { src: '/icons/icon-512.png', sizes: '512x512', type: 'image/png', purpose: 'any' },
      { src: '/icons/maskable-512.png', sizes: '512x512', type: 'image/png', purpose: 'maskable' },
      { src: '/icons/icon.svg', sizes: 'any', type: 'image/svg+xml', purpose: 'any' },
    ],
  };
}
