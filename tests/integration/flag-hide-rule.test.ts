import { beforeAll, describe, expect, it } from 'vitest';
import { initModels } from '@/models';
import type { Role } from '@/lib/auth/policy';
import { POST as flagPOST } from '@/app/api/flags/route';
import { GET as reviewGET } from '@/app/api/review/route';
import { FLAG_COUNTS_AFTER_DAYS, hideThreshold } from '@/lib/moderation/flags';
import { freshDemoDatabase } from '../support/db';
import { actAs } from '../support/act-as';

const { call } = actAs('10.12.3');
const DAY = 86_400_000;

/** Accounts made for this test: `age` days old, confirmed or not. */
async function accounts(prefix: string, n: number, opts: { ageDays: number; confirmed: boolean }) {
  const { User } = initModels();
  const made = new Date(Date.now() - opts.ageDays * DAY);
  const handles: string[] = [];
  for (let i = 0; i < n; i++) {
    const handle = `${prefix}_${i}`;
    await User.create({
      handle,
      displayName: handle,
      email: `${handle}@flags.example`,
      role: 'member',
      region: null,
      bio: null,
      emailVerifiedAt: opts.confirmed ? made : null,
      createdAt: made,
    });
    handles.push(handle);
  }
  return handles;
}

async function answerByRole(handle: string, role: Role) {
  const { User, Question, Answer } = initModels();
  const author =
    (await User.findOne({ where: { handle } })) ??
    (await User.create({
      handle,
      displayName: handle,
      email: `${handle}@flags.example`,
      role,
      region: null,
      bio: null,
      emailVerifiedAt: new Date(),
    }));
  const q = (await Question.findOne({ order: [['id', 'ASC']] }))!;
  return Answer.create({
    questionId: q.id,
    authorId: author.id,
    body: 'Size the drive pipe for the fall, not the flow.',
  });
}

async function flagAll(handles: string[], postId: number, reason = 'spam') {
  for (const who of handles)
    expect((await call(flagPOST, 'POST', '/api/flags', who, { postType: 'answer', postId, reason })).status).toBe(201);
}

const hiddenNow = async (id: number) => (await initModels().Answer.findByPk(id))!.hiddenAt !== null;
const queued = async (id: number) =>
  (await call(reviewGET, 'GET', '/api/review', 'moss_moderator')).body.items.some(
    (i: { post: { type: string; id: number } }) => i.post.type === 'answer' && i.post.id === id,
  );

describe('which flags hide a post by themselves (real MariaDB)', () => {
  let established: string[];
  beforeAll(async () => {
    await freshDemoDatabase();
    // a year old and confirmed: well past FLAG_COUNTS_AFTER_DAYS (lib/moderation/flags.ts)
    established = await accounts('settled', hideThreshold(), { ageDays: 365, confirmed: true });
  });

  it('throwaway accounts (new, or never confirmed) bring a member’s post to the queue but do not hide it', async () => {
    const fresh = await accounts('fresh', hideThreshold(), { ageDays: 0, confirmed: true });
    const a = await answerByRole('flag_target_one', 'member');
    await flagAll(fresh, a.id);
    expect(await hiddenNow(a.id)).toBe(false);
    expect(await queued(a.id)).toBe(true);

    const unconfirmed = await accounts('unconfirmed', hideThreshold(), { ageDays: 365, confirmed: false });
    const b = await answerByRole('flag_target_two', 'member');
    await flagAll(unconfirmed, b.id);
    expect(await hiddenNow(b.id)).toBe(false);
    expect(await queued(b.id)).toBe(true);

    // one day short of counting: still a throwaway
    const almost = await accounts('almost', hideThreshold(), { ageDays: FLAG_COUNTS_AFTER_DAYS - 1, confirmed: true });
    const c = await answerByRole('flag_target_three', 'member');
    await flagAll(almost, c.id);
    expect(await hiddenNow(c.id)).toBe(false);
  });

  it('established members’ flags hide a member’s post at the threshold', async () => {
    const a = await answerByRole('flag_target_four', 'member');
    await flagAll(established, a.id);
    expect(await hiddenNow(a.id)).toBe(true);
  });

  it('members’ flags never hide an expert’s, a moderator’s or an admin’s post: it waits in the queue, visible', async () => {
    for (const role of ['expert', 'moderator', 'admin'] as const) {
      const a = await answerByRole(`flag_target_${role}`, role);
      await flagAll(established, a.id);
      expect(await hiddenNow(a.id), role).toBe(false);
      expect(await queued(a.id), role).toBe(true);
    }
  });

  it('an expert’s unsafe-advice flag still hides a member’s post at once, but not a moderator’s or an admin’s', async () => {
    const a = await answerByRole('flag_target_five', 'member');
    await flagAll(['ironwheel_builds'], a.id, 'unsafe');
    expect(await hiddenNow(a.id)).toBe(true);
    for (const role of ['moderator', 'admin'] as const) {
      const b = await answerByRole(`flag_target_${role}_unsafe`, role);
      await flagAll(['ironwheel_builds'], b.id, 'unsafe');
      expect(await hiddenNow(b.id), role).toBe(false);
      expect(await queued(b.id), role).toBe(true);
    }
  });
});
