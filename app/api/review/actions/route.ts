import { NextResponse } from 'next/server';
import { readJson } from '@/lib/http/body';
import { guarded } from '@/lib/http/guard';
import { moderationActionSchema } from '@/lib/validation/moderation';
import { moderate } from '@/lib/moderation/actions';

export const dynamic = 'force-dynamic';

/** POST /api/review/actions — dismiss, hide, restore, delete, lock, unlock, retag, warn or suspend, with a reason. */
export async function POST(request: Request) {
  return guarded(request, 'moderation.act', async (user) => {
    const body = await readJson(request, moderationActionSchema);
    if ('response' in body) return body.response;
    return NextResponse.json(await moderate(user, body.data));
  });
}
