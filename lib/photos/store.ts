import { Op, type Transaction } from 'sequelize';
import { initModels } from '@/models';
import { isPhotoId, photoUrl } from './storage';

export interface PhotoTarget {
  questionId?: number;
  answerId?: number;
  fieldLogEntryId?: number;
}

/**
 * Attaches photos to the question or answer being saved, inside its transaction.
 * Only the owner's own photos that are not yet attached move; ids that are
 * malformed, someone else's or already used are skipped. Returns how many moved,
 * so the caller can refuse when fewer than it sent.
 */
export async function attachPhotos(publicIds: string[], ownerId: number, target: PhotoTarget, transaction?: Transaction): Promise<number> {
  const questionId = target.questionId ?? null;
  const answerId = target.answerId ?? null;
  const fieldLogEntryId = target.fieldLogEntryId ?? null;
  if (questionId === null && answerId === null && fieldLogEntryId === null) throw new Error('attachPhotos needs a questionId, an answerId or a fieldLogEntryId');
  const ids = [...new Set(publicIds.filter(isPhotoId))];
  if (ids.length === 0) return 0;
  const { Photo } = initModels();
  const [moved] = await Photo.update(
    { questionId, answerId, fieldLogEntryId },
    { where: { publicId: { [Op.in]: ids }, ownerId, questionId: null, answerId: null, fieldLogEntryId: null }, transaction },
  );
  return moved;
}

export interface PhotoView {
  id: string;
  width: number;
  height: number;
  alt: string | null;
  url: string;
  thumbUrl: string;
}

/** The photos shown with a question or an answer, oldest first (the order they were added). */
export async function photosFor(target: PhotoTarget, transaction?: Transaction): Promise<PhotoView[]> {
  const { Photo } = initModels();
  const where =
    target.fieldLogEntryId !== undefined ? { fieldLogEntryId: target.fieldLogEntryId } : target.answerId !== undefined ? { answerId: target.answerId } : { questionId: target.questionId ?? -1, answerId: null };
  const rows = await Photo.findAll({ where, order: [['id', 'ASC']], transaction });
  return rows.map((p) => ({ id: p.publicId, width: p.width, height: p.height, alt: p.alt, url: photoUrl(p.publicId), thumbUrl: photoUrl(p.publicId, 'thumb') }));
}
