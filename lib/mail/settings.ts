import 'server-only';
import { Op } from 'sequelize';
import { getSequelize } from '@/lib/db';
import { initModels } from '@/models';
import type { User } from '@/models/User';
import type { MailSettings } from '@/lib/validation/mail';

/** One member's e-mail choices, as the settings page and GET /api/account/mail show them. */
export async function loadMailSettings(
  userId: number,
): Promise<{ settings: MailSettings; tagChoices: { slug: string; name: string }[] } | null> {
  const { User, Tag, TagFollow } = initModels();
  const u = await User.findByPk(userId);
  if (!u) return null;
  const [follows, tags] = await Promise.all([
    TagFollow.findAll({ where: { userId } }),
    Tag.findAll({ attributes: ['id', 'slug', 'name'], order: [['name', 'ASC']] }),
  ]);
  const followed = new Set(follows.map((f) => f.tagId));
  return {
    settings: {
      digest: u.digestFrequency,
      tags: tags.filter((t) => followed.has(t.id)).map((t) => t.slug),
      notify: view(u),
    },
    tagChoices: tags.map((t) => ({ slug: t.slug, name: t.name })),
  };
}

function view(u: User): MailSettings['notify'] {
  return {
    answers: u.notifyAnswers,
    replies: u.notifyReplies,
    fixed: u.notifyFixed,
    moderation: u.notifyModeration,
    expert: u.notifyExpert,
  };
}

export type SaveOutcome = { ok: true } | { ok: false; status: number; field: string; message: string };

/** Saves the choices and the followed tags in one transaction; an unknown tag saves nothing. */
export async function saveMailSettings(userId: number, s: MailSettings): Promise<SaveOutcome> {
  const { User, Tag, TagFollow } = initModels();
  const slugs = [...new Set(s.tags)];
  return getSequelize().transaction(async (transaction) => {
    const tags = slugs.length
      ? await Tag.findAll({ where: { slug: { [Op.in]: slugs } }, attributes: ['id', 'slug'], transaction })
      : [];
    const missing = slugs.filter((slug) => !tags.some((t) => t.slug === slug));
    if (missing.length)
      return {
        ok: false as const,
        status: 422,
        field: 'tags',
        message: `tags: there is no tag ${missing.map((m) => `“${m}”`).join(', ')}`,
      };
    await User.update(
      {
        digestFrequency: s.digest,
        notifyAnswers: s.notify.answers,
        notifyReplies: s.notify.replies,
        notifyFixed: s.notify.fixed,
        notifyModeration: s.notify.moderation,
        notifyExpert: s.notify.expert,
      },
      { where: { id: userId }, transaction },
    );
    await TagFollow.destroy({ where: { userId }, transaction });
    if (tags.length)
      await TagFollow.bulkCreate(
        tags.map((t) => ({ userId, tagId: t.id })),
        { transaction },
      );
    return { ok: true as const };
  });
}
