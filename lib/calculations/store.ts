import { randomBytes } from 'node:crypto';
import type { Transaction } from 'sequelize';
import type { CalculatorId } from '@/lib/calculators';
import { initModels } from '@/models';

/** A permalink id: 10 characters of base62 from 8 random bytes — not guessable, short enough to share. */
export function newPublicId(): string {
  const alphabet = '0123456789ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz';
  let n = BigInt(`0x${randomBytes(8).toString('hex')}`);
  let out = '';
  while (out.length < 10) {
    out += alphabet[Number(n % 62n)];
    n /= 62n;
  }
  return out;
}

export interface NewWorkedCalculation {
  tool: CalculatorId;
  /** the inputs as typed, each with its unit */
  form: Record<string, string>;
  results: unknown;
  engineVersion: string;
  authorId: number | null;
  title?: string | null;
  /** the author's own site it was worked out from (checked by the caller) */
  siteId?: number | null;
}

/**
 * The inputs limited to the tool's own fields, in the field order, on an object with
 * no prototype: anything else a client sends ("__proto__", a stray "results") is not
 * stored and never reaches a reader's "try with my numbers".
 */
export function keepToolFields(form: Record<string, string>, fields: readonly string[]): Record<string, string> {
  const kept: Record<string, string> = Object.create(null);
  for (const f of fields)
    if (Object.prototype.hasOwnProperty.call(form, f) && typeof form[f] === 'string') kept[f] = form[f];
  return kept;
}

export async function saveWorkedCalculation(c: NewWorkedCalculation, transaction?: Transaction) {
  const { WorkedCalculation } = initModels();
  return WorkedCalculation.create(
    {
      publicId: newPublicId(),
      tool: c.tool,
      inputs: c.form,
      results: c.results as Record<string, unknown>,
      engineVersion: c.engineVersion,
      authorId: c.authorId,
      title: c.title ?? null,
      siteId: c.siteId ?? null,
    },
    { transaction },
  );
}

export async function findWorkedCalculation(publicId: string) {
  if (!/^[0-9A-Za-z]{6,16}$/.test(publicId)) return null;
  const { WorkedCalculation, User } = initModels();
  return WorkedCalculation.findOne({
    where: { publicId },
    include: [{ model: User, as: 'author', attributes: ['handle', 'displayName', 'role'] }],
  });
}
