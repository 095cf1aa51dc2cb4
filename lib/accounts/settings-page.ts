import { can, type Actor } from '@/lib/auth/policy';
import { loadMailSettings } from '@/lib/mail/settings';
import { initModels } from '@/models';

export interface NoticeView {
  id: number;
  message: string;
  link: string | null;
  createdAt: Date;
  /** not read before this visit */
  fresh: boolean;
}

/**
 * What the member's own settings page shows: the profile form's values, the e-mail
 * settings, whether they may apply to be an expert, and their latest notices. The
 * caller has checked `profile.read` on the member's own account; null when the
 * account is gone.
 */
export async function loadSettingsPage(user: Actor) {
  const { User, Notice } = initModels();
  const row = await User.findByPk(user.id);
  const notices = can(user, 'notice.read', user.id)
    ? await Notice.findAll({
        where: { userId: user.id },
        order: [
          ['createdAt', 'DESC'],
          ['id', 'DESC'],
        ],
        limit: 50,
      })
    : [];
  // shown on this page is read: the header's badge clears at the next session read
  if (notices.some((n) => n.readAt === null))
    await Notice.update({ readAt: new Date() }, { where: { userId: user.id, readAt: null } });
  const mail = await loadMailSettings(user.id);
  if (!row || !mail) return null;
  return {
    expert: can(row, 'digest.expertSections'),
    mail,
    handle: row.handle,
    canApply: can(user, 'expertApplication.submit'),
    values: { displayName: row.displayName, region: row.region ?? '', bio: row.bio ?? '', units: row.units },
    notices: notices.map((n): NoticeView => ({
      id: n.id,
      message: n.message,
      link: n.link,
      createdAt: n.createdAt,
      fresh: n.readAt === null,
    })),
  };
}
