// Builds the service worker (app/sw.ts) into public/sw.js after `next build`: esbuild bundles
// Serwist with our routes, then @serwist/build lists the build's static files for the precache.
import { readFileSync, rmSync } from 'node:fs';
import { build } from 'esbuild';
import { injectManifest } from '@serwist/build';

const buildId = readFileSync('.next/BUILD_ID', 'utf8').trim();
const bundled = '.next/sw.bundled.js';

await build({
  entryPoints: ['app/sw.ts'],
  outfile: bundled,
  bundle: true,
  format: 'iife',
  target: 'es2022',
  minify: true,
  // Serwist's logging is for development only
  define: { 'process.env.NODE_ENV': '"production"' },
  logLevel: 'warning',
});

const { count, size, warnings } = await injectManifest({
  swSrc: bundled,
  swDest: 'public/sw.js',
  globDirectory: '.next',
  // the scripts, styles and fonts every page is made of; pages themselves are kept as read
  globPatterns: ['static/**/*.{js,css,woff2}'],
  // the body face's other scripts load only for text that needs them (unicode-range)
  globIgnores: ['static/media/literata-{cyrillic,cyrillic-ext,greek,greek-ext,vietnamese}-*'],
  modifyURLPrefix: { 'static/': '/_next/static/' },
  // file names already carry a content hash
  dontCacheBustURLsMatching: /^\/_next\/static\//,
  additionalPrecacheEntries: [
    { url: '/offline', revision: buildId },
    { url: '/icons/icon-192.png', revision: buildId },
  ],
  maximumFileSizeToCacheInBytes: 4 * 1024 * 1024,
});
rmSync(bundled);
for (const w of warnings) console.warn(`service worker: ${w}`);
console.log(`service worker: public/sw.js precaches ${count} files, ${Math.round(size / 1024)} kB`);
