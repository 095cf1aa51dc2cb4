import { NextResponse } from 'next/server';
import { readJson } from '@/lib/http/body';
import { apiError } from '@/lib/http/errors';
import { guarded } from '@/lib/http/guard';
import { expertApplicationSchema } from '@/lib/validation/community';
import { listPendingApplications, submitExpertApplication } from '@/lib/accounts/roles';

export const dynamic = 'force-dynamic';

/** POST /api/expert-applications — a member asks for expert standing. */
export async function POST(request: Request) {
  return guarded(request, 'expertApplication.submit', async (user) => {
    const body = await readJson(request, expertApplicationSchema);
    if ('response' in body) return body.response;
    const out = await submitExpertApplication(user.id, body.data);
    if (!out.ok) return apiError(out.status, out.message, out.field, out.code);
    return NextResponse.json({ id: out.id, status: 'pending' }, { status: 201 });
  });
}

/** GET /api/expert-applications — moderators: the applications waiting for a decision. */
export async function GET(request: Request) {
  return guarded(request, 'expertApplication.decide', async () =>
    NextResponse.json({ items: await listPendingApplications() }),
  );
}
