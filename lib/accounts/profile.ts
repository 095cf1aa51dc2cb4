import { initModels } from '@/models';

/** A member's public profile and their worked calculations. Public fields only: never the e-mail or anything from the account's private side. */
export async function publicProfile(handle: string) {
  if (!/^[a-z0-9_]{1,40}$/.test(handle)) return null;
  const { User, WorkedCalculation } = initModels();
  const person = await User.findOne({
    where: { handle },
    attributes: ['id', 'handle', 'displayName', 'role', 'region', 'bio', 'createdAt'],
  });
  if (!person) return null;
  const calculations = await WorkedCalculation.findAll({
    where: { authorId: person.id },
    attributes: ['publicId', 'tool', 'title', 'createdAt'],
    order: [
      ['createdAt', 'DESC'],
      ['id', 'DESC'],
    ],
    limit: 100,
  });
  return { person, calculations };
}
