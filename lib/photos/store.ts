import { Op, type Transaction } from 'sequelize';
import { initModels } from '@/models';
import { isPhotoId } from './storage';

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
export async function attachPhotos(
  publicIds: string[],
  ownerId: number,
  target: PhotoTarget,
  transaction?: Transaction,
): Promise<number> {
  const questionId = target.questionId ?? null;
  const answerId = target.answerId ?? null;
  const fieldLogEntryId = target.fieldLogEntryId ?? null;
  if (questionId === null && answerId === null && fieldLogEntryId === null)
    throw new Error('attachPhotos needs a questionId, an answerId or a fieldLogEntryId');
  const ids = [...new Set(publicIds.filter(isPhotoId))];
  if (ids.length === 0) return 0;
  const { Photo } = initModels();
  const [moved] = await Photo.update(
    { questionId, answerId, fieldLogEntryId },
    {
      where: { publicId: { [Op.in]: ids }, ownerId, questionId: null, answerId: null, fieldLogEntryId: null },
      transaction,
    },
  );
  return moved;
}
