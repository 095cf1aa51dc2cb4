import 'server-only';
import { initModels } from '@/models';
import { columnsFor, SCOPE_WORDS, verifyUnsubscribe, type UnsubscribeScope } from './unsubscribe';

export type UnsubscribeOutcome =
  | { ok: true; scope: UnsubscribeScope; message: string }
  | { ok: false; status: number; field?: string; message: string };

/** Checks a link and switches off what it names; the same link used twice is still a success. */
export async function applyUnsubscribe(params: {
  u?: string | null;
  s?: string | null;
  t?: string | null;
}): Promise<UnsubscribeOutcome> {
  const check = verifyUnsubscribe(params);
  if (!check.ok)
    return { ok: false, status: check.field === 't' ? 403 : 400, field: check.field, message: check.message };
  const [n] = await initModels().User.update(columnsFor(check.scope), { where: { id: check.userId } });
  const exists = n > 0 || (await initModels().User.count({ where: { id: check.userId } })) > 0;
  if (!exists)
    return {
      ok: false,
      status: 404,
      message: 'The account this link was for no longer exists, so nothing will be sent to it.',
    };
  return {
    ok: true,
    scope: check.scope,
    message: `Done: ${SCOPE_WORDS[check.scope]} is switched off. You can switch it back on in your settings.`,
  };
}
