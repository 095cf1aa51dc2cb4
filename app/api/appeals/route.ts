import { NextResponse } from 'next/server';
import { readJson } from '@/lib/http/body';
import { guarded } from '@/lib/http/guard';
import { appealSchema } from '@/lib/validation/moderation';
import { submitAppeal } from '@/lib/moderation/appeals';

export const dynamic = 'force-dynamic';

/** POST /api/appeals — the author asks the moderators to review a decision on their post. */
export async function POST(request: Request) {
  return guarded(request, 'moderation.appeal', async (user) => {
    const body = await readJson(request, appealSchema);
    if ('response' in body) return body.response;
    return NextResponse.json(await submitAppeal(user, body.data), { status: 201 });
  });
}
