import sharp from 'sharp';
import type { Transaction } from 'sequelize';
import { initModels } from '@/models';
import { newPhotoId, writeVariant } from '@/lib/photos/storage';
import { palette } from '@/tailwind.config';

/**
 * A generated picture for the demo (no real photographs): a simple drawing of a ram
 * on a sill with its drive pipe and delivery line, captioned, rendered by sharp.
 */
function sketch(caption: string): string {
  const c = palette;
  return `<svg xmlns="http://www.w3.org/2000/svg" width="1200" height="800" viewBox="0 0 1200 800">
  <rect width="1200" height="800" fill="${c.limestone[200]}"/>
  <path d="M0 520 C300 480 600 560 1200 500 L1200 800 L0 800 Z" fill="${c.creek[400]}"/>
  <rect x="80" y="250" width="560" height="22" transform="rotate(14 80 250)" fill="${c.creek[700]}"/>
  <rect x="620" y="360" width="120" height="120" rx="10" fill="${c.clay[500]}"/>
  <rect x="650" y="200" width="60" height="160" rx="28" fill="${c.clay[600]}"/>
  <path d="M710 260 C900 240 1000 140 1150 80" stroke="${c.moss[500]}" stroke-width="14" fill="none"/>
  <text x="60" y="90" font-family="sans-serif" font-size="54" fill="${c.creek[800]}">${caption.replace(/[<&>]/g, '')}</text>
  <text x="60" y="150" font-family="sans-serif" font-size="28" fill="${c.creek[600]}">generated drawing for the demo</text>
</svg>`;
}

export async function seedPhoto(
  p: { ownerId: number; questionId?: number; answerId?: number; alt: string; caption: string },
  transaction: Transaction,
) {
  const { Photo } = initModels();
  const publicId = newPhotoId();
  const png = await sharp(Buffer.from(sketch(p.caption)))
    .png()
    .toBuffer();
  const web = await sharp(png).resize({ width: 1200, withoutEnlargement: true }).webp({ quality: 80 }).toBuffer();
  const thumb = await sharp(png).resize({ width: 320 }).webp({ quality: 75 }).toBuffer();
  await writeVariant(publicId, 'web', web);
  await writeVariant(publicId, 'thumb', thumb);
  const meta = await sharp(web).metadata();
  await Photo.create(
    {
      publicId,
      ownerId: p.ownerId,
      questionId: p.questionId ?? null,
      answerId: p.answerId ?? null,
      mime: 'image/webp',
      width: meta.width ?? 1200,
      height: meta.height ?? 800,
      bytes: web.length,
      alt: p.alt,
    },
    { transaction },
  );
}
