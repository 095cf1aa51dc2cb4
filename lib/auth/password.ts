import 'server-only';
import { hash, verify } from '@node-rs/argon2';
import { ZxcvbnFactory } from '@zxcvbn-ts/core';
import * as common from '@zxcvbn-ts/language-common';
import * as en from '@zxcvbn-ts/language-en';

/** argon2id with the library's defaults (19 MiB, t = 2, p = 1: OWASP's minimum recommendation). */
export function hashPassword(password: string): Promise<string> {
  return hash(password);
}

export async function verifyPassword(stored: string | null | undefined, password: string): Promise<boolean> {
  if (!stored) return false;
  try {
    return await verify(stored, password);
  } catch {
    return false;
  }
}

let checker: ZxcvbnFactory | undefined;
function zxcvbn() {
  checker ??= new ZxcvbnFactory({
    dictionary: { ...common.dictionary, ...en.dictionary },
    graphs: common.adjacencyGraphs,
    translations: en.translations,
  });
  return checker;
}

export const MIN_PASSWORD_LENGTH = 10;

/**
 * Refuses short, guessable and common (breached-looking) passwords with a reason,
 * using zxcvbn's dictionaries of common and leaked passwords. Returns null when fine.
 */
export function passwordProblem(password: string, userInputs: string[] = []): string | null {
  if (password.length < MIN_PASSWORD_LENGTH) return `must be at least ${MIN_PASSWORD_LENGTH} characters`;
  if (password.length > 200) return 'must be at most 200 characters';
  const r = zxcvbn().check(password, userInputs.filter(Boolean));
  if (r.score < 3) {
    const why = r.feedback.warning || 'it is too easy to guess';
    return `is too easy to guess (${why.replace(/\.$/, '').toLowerCase()}); try a few unrelated words`;
  }
  return null;
}
