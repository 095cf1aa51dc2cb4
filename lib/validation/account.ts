import { z } from 'zod';

const email = z
  .string({ error: 'email is required' })
  .trim()
  .toLowerCase()
  .max(254, 'email must be at most 254 characters')
  .pipe(z.email({ error: 'email must be an e-mail address like name@example.org' }));

/*
 * Display names. A name must show something, and must not pass its holder off as
 * staff or an expert: a member called "Moss (moderator)" or "Expert Ram Builder" would
 * lend their advice a standing the site never gave it. Role words are compared after
 * folding the usual disguises (full-width letters, accents, look-alike Cyrillic and
 * Greek letters, digits for letters, spaced-out letters, invisible characters), and a
 * word is allowed only to an account that holds the role it names.
 */

/** Invisible characters that only disguise: format and control characters, fillers that render blank. */
const INVISIBLE =
  /[\p{Cc}\p{Cf}\p{Zl}\p{Zp}\u034F\u115F\u1160\u17B4\u17B5\u180E\u2800\u3164\uFFA0\uFE00-\uFE0F]|[\u{E0100}-\u{E01EF}]/gu;
/** Joiners that scripts and emoji need between visible characters; every other invisible character is dropped. */
const JOINERS = new Set(['\u200C', '\u200D']);

const LOOK_ALIKE: Record<string, string> = {
  а: 'a',
  в: 'b',
  е: 'e',
  ё: 'e',
  к: 'k',
  м: 'm',
  н: 'h',
  о: 'o',
  р: 'p',
  с: 'c',
  т: 't',
  у: 'y',
  х: 'x',
  і: 'i',
  ї: 'i',
  ј: 'j',
  ѕ: 's',
  ԁ: 'd',
  ԛ: 'q',
  ԝ: 'w',
  ɑ: 'a',
  ı: 'i',
  α: 'a',
  β: 'b',
  ε: 'e',
  η: 'n',
  ι: 'i',
  κ: 'k',
  ν: 'v',
  ο: 'o',
  ρ: 'p',
  τ: 't',
  υ: 'u',
  χ: 'x',
  μ: 'u',
  '0': 'o',
  '1': 'i',
  '3': 'e',
  '4': 'a',
  '5': 's',
  '7': 't',
  '@': 'a',
  $: 's',
  '|': 'l',
  '!': 'i',
};

type Role = 'member' | 'expert' | 'moderator' | 'admin';
const STAFF = ['staff', 'official', 'clackwater', 'sysop'];
const MODERATOR = ['mod', 'mods', 'moderator', 'moderators', 'moderation'];
const ADMIN = ['admin', 'admins', 'administrator', 'administrators'];
const EXPERT = ['expert', 'experts'];
/** The role words each role may carry in its name. */
const ALLOWED: Record<Role, Set<string>> = {
  member: new Set(),
  expert: new Set(EXPERT),
  moderator: new Set([...MODERATOR, ...STAFF]),
  admin: new Set([...ADMIN, ...MODERATOR, ...STAFF]),
};
const ROLE_WORDS = [...STAFF, ...MODERATOR, ...ADMIN, ...EXPERT];
/** Long enough that no innocent name hides them: found inside a longer word too ("MossModerator"). */
const INSIDE_WORDS = ['moderator', 'administrator', 'clackwater'];

/** Drops the invisible characters a name does not need, keeping joiners between visible ones; the rest stays as typed. */
export function cleanDisplayName(raw: string): string {
  const chars = [...raw];
  return chars
    .filter((c, i) => {
      if (!c.match(INVISIBLE)) return true;
      return (
        JOINERS.has(c) &&
        i > 0 &&
        i < chars.length - 1 &&
        !chars[i - 1]?.match(INVISIBLE) &&
        !chars[i + 1]?.match(INVISIBLE)
      );
    })
    .join('')
    .trim();
}

/** The name as the eye reads it, folded to plain lower-case letters for comparison. */
function folded(name: string): string {
  const plain = name.normalize('NFKD').replace(/\p{M}/gu, '').replace(INVISIBLE, '').toLowerCase();
  return [...plain].map((c) => LOOK_ALIKE[c] ?? c).join('');
}

/** "M o d", "a.d.m.i.n": runs of single letters with separators between them, each read as one word. */
const spacedOut = (text: string) =>
  (text.match(/(?<!\p{L})\p{L}(?:[\s._\-·*~/\\]+\p{L}(?!\p{L}))+/gu) ?? []).map((m) => m.replace(/[^\p{L}]/gu, ''));

/** The first role word in a name that its holder's role does not carry, if any. */
export function borrowedRoleWord(name: string, role: Role): string | undefined {
  const text = folded(name);
  const words = text.split(/[^\p{L}]+/u).filter(Boolean);
  const runs = spacedOut(text);
  const found = [
    ...ROLE_WORDS.filter((w) => words.includes(w) || runs.some((r) => r.includes(w))),
    ...INSIDE_WORDS.filter((w) => text.includes(w)),
  ];
  return found.find((w) => !ALLOWED[role].has(w));
}

/** Characters a reader sees: letters, digits, punctuation and symbols (not spaces, marks or invisible ones). */
const visibleCount = (name: string) => [...name.replace(INVISIBLE, '').replace(/[\s\p{Z}\p{M}]/gu, '')].length;

/**
 * The display-name field for sign-up and settings. `role` is the account's role:
 * sign-up is always a member's; settings pass the caller's, so a moderator keeps
 * "(moderator)" in their name and an expert may say so.
 */
export function displayNameSchema(role: Role = 'member') {
  return z
    .string({ error: 'displayName is required' })
    .transform(cleanDisplayName)
    .pipe(
      z
        .string()
        .min(2, 'displayName must be at least 2 characters')
        .max(80, 'displayName must be at most 80 characters'),
    )
    .superRefine((name, ctx) => {
      if (visibleCount(name) < 2 || !/[\p{L}\p{N}]/u.test(name)) {
        ctx.addIssue({
          code: 'custom',
          message: 'displayName must show at least 2 characters, with a letter or a digit among them',
        });
        return;
      }
      const word = borrowedRoleWord(name, role);
      if (word)
        ctx.addIssue({
          code: 'custom',
          message: `displayName must not claim a role on Clackwater (it reads as “${word}”); badges show roles`,
        });
    });
}

/** The handle's rule, in the words the sign-up form shows beside the field and the API answers with. */
export const HANDLE_RULE = '3 to 30 characters: lower-case letters, digits or underscores (_)';
export const HANDLE_MESSAGE = `handle must be ${HANDLE_RULE}`;
const HANDLE_PATTERN = /^[a-z0-9_]{3,30}$/;

export const signUpSchema = z.object({
  email,
  password: z.string({ error: 'password is required' }),
  handle: z.string({ error: 'handle is required' }).trim().regex(HANDLE_PATTERN, HANDLE_MESSAGE),
  displayName: displayNameSchema('member'),
});

export const emailOnlySchema = z.object({ email });

export const tokenSchema = z.object({
  token: z.string({ error: 'token is required' }).min(20, 'token is not valid').max(100, 'token is not valid'),
});

export const newPasswordSchema = tokenSchema.extend({ password: z.string({ error: 'password is required' }) });
