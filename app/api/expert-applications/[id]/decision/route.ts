import { NextResponse } from 'next/server';
import { readJson } from '@/lib/http/body';
import { apiError } from '@/lib/http/errors';
import { guarded } from '@/lib/http/guard';
import { expertDecisionSchema, routeId } from '@/lib/validation/community';
import { decideExpertApplication } from '@/lib/accounts/roles';

export const dynamic = 'force-dynamic';

/** POST /api/expert-applications/:id/decision — a moderator approves or declines, with a note to the applicant. */
export async function POST(request: Request, { params }: { params: Promise<{ id: string }> }) {
  return guarded(request, 'expertApplication.decide', async (user) => {
    const id = routeId((await params).id);
    if (id === null) return apiError(404, 'There is no such expert application.', 'id', 'not_found');
    const body = await readJson(request, expertDecisionSchema);
    if ('response' in body) return body.response;
    const out = await decideExpertApplication(user.id, id, body.data.decision, body.data.note);
    if (!out.ok) return apiError(out.status, out.message, out.field, out.code);
    return NextResponse.json({ id, status: out.status, applicantRole: out.role });
  });
}
