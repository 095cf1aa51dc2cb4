// Draws the app icons (public/icons) from the mark in components/Logo.tsx, in the palette of
// DESIGN.md "Look". Run by hand when the mark changes: node scripts/make-icons.mjs
import { writeFileSync } from 'node:fs';
import sharp from 'sharp';

const SLATE = '#1f3a3d';
const LIMESTONE = '#f4f1ea';
const CLAY = '#b5562b';

/** The mark on a slate ground; `inset` shrinks it into the middle for maskable icons. */
function svg({ rounded, inset }) {
  const scale = 1 - 2 * inset;
  const offset = 32 * inset;
  return `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 32 32">
  <rect width="32" height="32" rx="${rounded ? 6 : 0}" fill="${SLATE}"/>
  <g transform="translate(${offset} ${offset}) scale(${scale})">
    <path d="M16 4c4.2 5.6 7.4 9.5 7.4 13.2a7.4 7.4 0 0 1-14.8 0C8.6 13.5 11.8 9.6 16 4z" fill="${LIMESTONE}"/>
    <path d="M3 27h5l2-4 3 4h3l2-4 3 4h3l2-4 3 4" fill="none" stroke="${CLAY}" stroke-width="1.8" stroke-linejoin="round" stroke-linecap="round"/>
  </g>
</svg>
`;
}

const any = svg({ rounded: true, inset: 0 });
// a maskable icon's safe zone is the middle 80% (W3C Web App Manifest, "icon masks")
const maskable = svg({ rounded: false, inset: 0.14 });
writeFileSync('public/icons/icon.svg', any);
for (const size of [192, 512]) {
  await sharp(Buffer.from(any), { density: (72 * size) / 32 })
    .resize(size, size)
    .png()
    .toFile(`public/icons/icon-${size}.png`);
}
await sharp(Buffer.from(maskable), { density: (72 * 512) / 32 })
  .resize(512, 512)
  .png()
  .toFile('public/icons/maskable-512.png');
