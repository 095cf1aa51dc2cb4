import type { Sequelize } from 'sequelize';
import { initModels } from '@/models';
import { contentHash, readGuideFile } from '@/lib/guides/content';
import { toDate } from '@/lib/dates';
import { computeFromForm } from '@/lib/calculators';
import { newPublicId } from '@/lib/calculations/store';
import { hashPassword } from '@/lib/auth/password';
import { demoThreads } from './demo-forum-data';
import { seedPhoto } from './demo-photos';
import { seedFieldLog } from './demo-field-log';
import { seedSites } from './demo-sites';
import {
  DEMO_PASSWORD,
  demoMailChoices,
  demoCalculations,
  demoQuestions,
  demoSafetyChecks,
  demoTags,
  demoUsers,
} from './demo-data';

const DAY = 86_400_000;

/**
 * Seeds the invented demo scenario in one transaction. Returns false and writes
 * nothing when the database already holds members (a second `npm start`).
 */
export async function seedDemo(sequelize: Sequelize, now = new Date()): Promise<boolean> {
  const {
    User,
    Tag,
    Question,
    Answer,
    QuestionTag,
    SafetyCheck,
    WorkedCalculation,
    Reply,
    Revision,
    HelpfulMark,
    TagFollow,
  } = initModels(sequelize);
  if ((await User.count()) > 0) return false;

  const passwordHash = await hashPassword(DEMO_PASSWORD);
  await sequelize.transaction(async (transaction) => {
    const users = await User.bulkCreate(
      demoUsers.map((u) => ({
        ...u,
        passwordHash,
        emailVerifiedAt: now,
        createdAt: new Date(now.getTime() - 400 * DAY),
        updatedAt: now,
      })),
      { transaction },
    );
    const userId = new Map(users.map((u) => [u.handle, u.id]));
    const tags = await Tag.bulkCreate([...demoTags], { transaction });
    const tagId = new Map(tags.map((t) => [t.slug, t.id]));
    for (const [handle, choice] of Object.entries(demoMailChoices)) {
      await User.update({ digestFrequency: choice.digest }, { where: { id: must(userId, handle) }, transaction });
      await TagFollow.bulkCreate(
        choice.follows.map((slug) => ({ userId: must(userId, handle), tagId: must(tagId, slug) })),
        { transaction },
      );
    }

    for (const q of demoQuestions) {
      const createdAt = new Date(now.getTime() - q.daysAgo * DAY);
      const question = await Question.create(
        {
          authorId: must(userId, q.author),
          title: q.title,
          body: q.body,
          answerCount: q.answers.length,
          fixedAnswerId: null,
          createdAt,
          updatedAt: createdAt,
        },
        { transaction },
      );
      await QuestionTag.bulkCreate(
        q.tags.map((slug) => ({ questionId: question.id, tagId: must(tagId, slug) })),
        { transaction },
      );
      for (const a of q.answers) {
        const at = new Date(createdAt.getTime() + a.hoursLater * 3_600_000);
        await Answer.create(
          { questionId: question.id, authorId: must(userId, a.author), body: a.body, createdAt: at, updatedAt: at },
          { transaction },
        );
      }
    }

    // A check keeps the guide file the expert read and is tied to its hash. A check on
    // an earlier wording keeps that wording, rebuilt from the file now, so the guide can
    // show what changed since; its date falls before the guide's "updated" day, and a
    // check on the text now never predates that day, so the two dates never disagree.
    for (const c of demoSafetyChecks) {
      const guide = readGuideFile(c.guide);
      if (!guide) continue;
      const updatedDay = toDate(guide.meta.updated).getTime();
      const text = c.earlier ? earlierWording(guide.raw, c.earlier) : guide.raw;
      const at = c.earlier
        ? new Date(toDate(c.earlier.updated).getTime() + (c.earlier.checkedDaysLater * 24 + 10) * 3_600_000)
        : new Date(Math.min(now.getTime(), Math.max(now.getTime() - (c.daysAgo ?? 0) * DAY, updatedDay)));
      await SafetyCheck.create(
        {
          guideSlug: c.guide,
          contentHash: contentHash(text),
          checkedText: text,
          expertId: must(userId, c.expert),
          verdict: c.verdict,
          notes: c.notes,
          createdAt: at,
          updatedAt: at,
        },
        { transaction },
      );
    }

    // Worked calculations are computed by the engine at seed time, like any saved one.
    for (const c of demoCalculations) {
      const out = computeFromForm(c.tool, c.inputs);
      if (!out.ok) throw new Error(`demo calculation ${c.title}: ${out.message}`);
      const at = new Date(now.getTime() - c.daysAgo * DAY);
      await WorkedCalculation.create(
        {
          publicId: c.publicId ?? newPublicId(),
          tool: c.tool,
          inputs: c.inputs,
          results: out.output.results as Record<string, unknown>,
          engineVersion: out.engineVersion,
          title: c.title,
          authorId: must(userId, c.author),
          createdAt: at,
          updatedAt: at,
        },
        { transaction },
      );
    }

    // The forum threads: site sheets, solved ones, replies, helpful marks, worked calculations, photos.
    const calcId = new Map(
      (await WorkedCalculation.findAll({ attributes: ['id', 'publicId'], transaction })).map((c) => [c.publicId, c.id]),
    );
    for (const t of demoThreads) {
      const createdAt = new Date(now.getTime() - t.daysAgo * DAY);
      const q = await Question.create(
        {
          authorId: must(userId, t.author),
          title: t.title,
          body: t.body,
          answerCount: t.answers.length,
          fixedAnswerId: null,
          siteSheet: t.siteSheet ?? null,
          lastActivityAt: createdAt,
          createdAt,
          updatedAt: createdAt,
        },
        { transaction },
      );
      await QuestionTag.bulkCreate(
        t.tags.map((slug) => ({ questionId: q.id, tagId: must(tagId, slug) })),
        { transaction },
      );
      await Revision.create(
        { postType: 'question', postId: q.id, editorId: q.authorId as number, title: q.title, body: q.body, createdAt },
        { transaction },
      );
      if (t.photo) await seedPhoto({ ownerId: q.authorId as number, questionId: q.id, ...t.photo }, transaction);
      const answerIds: number[] = [];
      for (const a of t.answers) {
        const at = new Date(createdAt.getTime() + a.hoursLater * 3_600_000);
        const row = await Answer.create(
          {
            questionId: q.id,
            authorId: must(userId, a.author),
            body: a.body,
            calculationId: a.calculation ? must(calcId, a.calculation) : null,
            helpfulCount: a.helpfulFrom?.length ?? 0,
            createdAt: at,
            updatedAt: at,
          },
          { transaction },
        );
        answerIds.push(row.id);
        await Revision.create(
          {
            postType: 'answer',
            postId: row.id,
            editorId: row.authorId as number,
            title: null,
            body: row.body,
            createdAt: at,
          },
          { transaction },
        );
        for (const who of a.helpfulFrom ?? [])
          await HelpfulMark.create(
            { postType: 'answer', postId: row.id, userId: must(userId, who), createdAt: at },
            { transaction },
          );
      }
      if (t.fixed !== undefined)
        await q.update({ fixedAnswerId: answerIds[t.fixed.answer], whatFixedIt: t.fixed.line }, { transaction });
      for (const r of t.replies ?? []) {
        const at = new Date(createdAt.getTime() + r.hoursLater * 3_600_000);
        const answerId = r.toAnswer !== undefined ? answerIds[r.toAnswer] : null;
        const reply = await Reply.create(
          {
            questionId: q.id,
            parentType: answerId ? 'answer' : 'question',
            answerId,
            replyToId: null,
            depth: 0,
            authorId: must(userId, r.author),
            body: r.body,
            createdAt: at,
            updatedAt: at,
          },
          { transaction },
        );
        await Revision.create(
          {
            postType: 'reply',
            postId: reply.id,
            editorId: reply.authorId,
            title: null,
            body: reply.body,
            createdAt: at,
          },
          { transaction },
        );
      }
    }

    await seedFieldLog(initModels(sequelize), (handle) => must(userId, handle), now, transaction);
    await seedSites(initModels(sequelize), (handle) => must(userId, handle), now, transaction);
  });
  return true;
}

function must<K, V>(map: Map<K, V>, key: K): V {
  const v = map.get(key);
  if (v === undefined) throw new Error(`demo data refers to unknown key ${String(key)}`);
  return v;
}

/** A guide file as it read before: its old "updated" day, without later sections, old sentences back. */
function earlierWording(
  raw: string,
  e: { updated: string; without?: string[]; was?: [now: string, then: string][] },
): string {
  let text = raw.replace(/^updated: .*$/m, `updated: "${e.updated}"`);
  for (const heading of e.without ?? []) {
    const start = text.indexOf(`\n${heading}\n`);
    if (start < 0) throw new Error(`demo safety check: no section "${heading}"`);
    const next = text.indexOf('\n## ', start + 1);
    text = text.slice(0, start) + (next < 0 ? '\n' : text.slice(next));
  }
  for (const [now, then] of e.was ?? []) {
    if (!text.includes(now)) throw new Error(`demo safety check: no sentence "${now}"`);
    text = text.replace(now, then);
  }
  return text;
}
