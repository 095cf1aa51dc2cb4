import 'server-only';
import { QueryTypes } from 'sequelize';
import { getSequelize } from '@/lib/db';

/**
 * One key per account for the per-account limits, whatever spelling was typed.
 *
 * The users table compares e-mail under its collation (utf8mb4_unicode_ci), which
 * takes "sëc-a@…", "sec-ａ@…" (full-width) and "SEC-Á@…" for one address; keying a
 * limit on the text as typed gave each spelling fresh tries on the one account. The
 * collation's own weight string is exactly the class it compares by, and the unique
 * index allows one account per class, so its hash names the account, or the address
 * that would be it.
 */
let collation: Promise<string> | null = null;

function emailCollation(): Promise<string> {
  collation ??= getSequelize()
    .query<{ c: string }>(
      `SELECT COLLATION_NAME AS c FROM information_schema.COLUMNS WHERE TABLE_SCHEMA = DATABASE() AND TABLE_NAME = 'users' AND COLUMN_NAME = 'email'`,
      { type: QueryTypes.SELECT },
    )
    .then((rows) => {
      const c = rows[0]?.c ?? 'utf8mb4_unicode_ci';
      // only ever interpolated from the schema itself, but never trust it as SQL
      if (!/^[a-z0-9_]+$/.test(c)) throw new Error(`unexpected collation ${c}`);
      return c;
    })
    .catch((err) => {
      collation = null;
      throw err;
    });
  return collation;
}

export async function accountLimitKey(email: string): Promise<string> {
  const typed = email.trim();
  if (!typed) return '(none)';
  const c = await emailCollation();
  const [row] = await getSequelize().query<{ k: string }>(
    `SELECT SHA2(WEIGHT_STRING(CONVERT(? USING utf8mb4) COLLATE ${c}), 256) AS k`,
    {
      replacements: [typed],
      type: QueryTypes.SELECT,
    },
  );
  if (!row) throw new Error('accountLimitKey: the database returned no row for SELECT SHA2(...)');
  return `account:${row.k}`;
}

/**
 * Whether the address typed is the account's own, not one the collation only
 * folds onto it: sign-in, links and resets answer only to the address as registered
 * (letter case aside, since addresses are stored lower-cased).
 */
export function sameAddress(typed: string, stored: string): boolean {
  return typed.trim().toLowerCase() === stored.trim().toLowerCase();
}
