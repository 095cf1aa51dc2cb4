import { NextResponse, type NextRequest } from 'next/server';
import { z } from 'zod';
import { queryObject, serverError, validationError } from '@/lib/http/errors';
import { parseQuantity } from '@/lib/hydraulics';
import { similarQuestions } from '@/lib/forum/posts';

export const dynamic = 'force-dynamic';
const schema = z.object({
  tags: z.string().max(300).default(''),
  fall: z.string().max(40).optional(),
  lift: z.string().max(40).optional(),
});

const lengthOf = (s?: string) => {
  try {
    return s ? parseQuantity(s, 'length') : undefined;
  } catch {
    return undefined;
  }
};

/** GET /api/questions/similar?tags=a,b&fall=4+ft&lift=29+ft — solved threads like this one. */
export async function GET(request: NextRequest) {
  const parsed = schema.safeParse(queryObject(request.nextUrl.searchParams));
  if (!parsed.success) return validationError(parsed.error);
  const tags = parsed.data.tags.split(',').map((t) => t.trim()).filter((t) => /^[a-z0-9-]{2,40}$/.test(t));
  try {
    return NextResponse.json({ items: await similarQuestions(tags, lengthOf(parsed.data.fall), lengthOf(parsed.data.lift)) });
  } catch (err) {
    return serverError(err);
  }
}
