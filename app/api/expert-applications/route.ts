import { NextResponse } from 'next/server';
import { readJson } from '@/lib/http/body';
import { apiError, serverError } from '@/lib/http/errors';
import { currentUser } from '@/lib/auth/session';
import { can, REFUSAL } from '@/lib/auth/policy';
import { expertApplicationSchema } from '@/lib/validation/community';
import { listPendingApplications, submitExpertApplication } from '@/lib/accounts/roles';

export const dynamic = 'force-dynamic';

/** POST /api/expert-applications — a member asks for expert standing. */
export async function POST(request: Request) {
  try {
    const user = await currentUser(request);
    if (!user) return apiError(401, 'Sign in to apply for expert standing.', undefined, 'unauthenticated');
    if (!can(user, 'expertApplication.submit')) return apiError(403, REFUSAL['expertApplication.submit'], undefined, 'forbidden');
    const body = await readJson(request, expertApplicationSchema);
    if ('response' in body) return body.response;
    const out = await submitExpertApplication(user.id, body.data);
    if (!out.ok) return apiError(out.status, out.message, out.field, out.code);
    return NextResponse.json({ id: out.id, status: 'pending' }, { status: 201 });
  } catch (err) {
    return serverError(err);
  }
}

/** GET /api/expert-applications — moderators: the applications waiting for a decision. */
export async function GET(request: Request) {
  try {
    const user = await currentUser(request);
    if (!user) return apiError(401, 'Sign in to see expert applications.', undefined, 'unauthenticated');
    if (!can(user, 'expertApplication.decide')) return apiError(403, REFUSAL['expertApplication.decide'], undefined, 'forbidden');
    return NextResponse.json({ items: await listPendingApplications() });
  } catch (err) {
    return serverError(err);
  }
}
