import { beforeAll, describe, expect, it } from 'vitest';
import { Op } from 'sequelize';
import { POST as actionPOST } from '@/app/api/review/actions/route';
import { initModels } from '@/models';
import { MODERATED_TYPES, type ModeratedType } from '@/lib/vocabulary';
import { freshDemoDatabase } from '../support/db';
import { actAs } from '../support/act-as';

const { call } = actAs('10.21.15');
const MOD = 'moss_moderator';
const act = (body: Record<string, unknown>) => call(actionPOST, 'POST', '/api/review/actions', MOD, body);

// The API's limit on a moderator's reason (lib/validation/moderation.ts); the hidden post keeps it whole.
const LIMIT = 1000;
/** A reason of exactly n characters, words a moderator might write, not one letter repeated. */
function reasonOf(n: number): string {
  const words = 'Hidden: the advice removes the waste valve and would let water hammer burst the drive pipe. ';
  return words.repeat(Math.ceil(n / words.length)).slice(0, n - 1) + '.';
}

/** One visible post of each kind, written by a member or an expert (a moderator may act on both). */
async function visiblePost(type: ModeratedType): Promise<{ id: number; reload: () => Promise<unknown> }> {
  const m = initModels();
  const authors = (await m.User.findAll({ where: { role: { [Op.in]: ['member', 'expert'] } } })).map((u) => u.id);
  const owner = type === 'photo' ? 'ownerId' : 'authorId';
  const where = { hiddenAt: null, deletedAt: null, [owner]: { [Op.in]: authors } };
  const model = {
    question: m.Question,
    answer: m.Answer,
    reply: m.Reply,
    photo: m.Photo,
    'field-log': m.FieldLogEntry,
  }[type] as unknown as { findOne: (o: object) => Promise<{ id: number; reload: () => Promise<unknown> } | null> };
  const post = await model.findOne({ where, order: [['id', 'ASC']] });
  if (!post) throw new Error(`the demo has no visible ${type} by a member or expert`);
  return post;
}

describe('a moderator’s reason is kept as long as the API accepts it (real MariaDB)', () => {
  beforeAll(freshDemoDatabase);

  it.each(MODERATED_TYPES)('hiding a %s with a 1,000-character reason saves it whole', async (type) => {
    const post = await visiblePost(type);
    const reason = reasonOf(LIMIT);
    expect(reason).toHaveLength(LIMIT);
    const res = await act({ action: 'hide', postType: type, postId: post.id, reason });
    expect(res.status).toBe(200);
    await post.reload();
    expect((post as unknown as { hiddenReason: string }).hiddenReason).toBe(reason);
    const audit = await initModels().AuditEntry.findOne({ order: [['id', 'DESC']] });
    expect(audit?.reason).toBe(reason);
  });

  it('refuses a reason one character over the limit, naming the field, and hides nothing', async () => {
    const post = await visiblePost('answer');
    const res = await act({ action: 'hide', postType: 'answer', postId: post.id, reason: reasonOf(LIMIT + 1) });
    expect(res.status).toBe(400);
    expect(res.body.error.field).toBe('reason');
    await post.reload();
    expect((post as unknown as { hiddenAt: Date | null }).hiddenAt).toBeNull();
  });
});
