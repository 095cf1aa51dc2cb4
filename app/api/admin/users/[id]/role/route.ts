import { NextResponse } from 'next/server';
import { readJson } from '@/lib/http/body';
import { apiError } from '@/lib/http/errors';
import { guarded } from '@/lib/http/guard';
import { roleChangeSchema, routeId } from '@/lib/validation/community';
import { changeRole } from '@/lib/accounts/roles';

export const dynamic = 'force-dynamic';

/** PUT /api/admin/users/:id/role — an admin sets another member's role. */
export async function PUT(request: Request, { params }: { params: Promise<{ id: string }> }) {
  return guarded(request, 'user.changeRole', async (user) => {
    const id = routeId((await params).id);
    if (id === null) return apiError(404, 'There is no such member.', 'id', 'not_found');
    const body = await readJson(request, roleChangeSchema);
    if ('response' in body) return body.response;
    const out = await changeRole(user.id, id, body.data.role);
    if (!out.ok) return apiError(out.status, out.message, out.field, out.code);
    return NextResponse.json({ id, role: out.role, changed: out.changed });
  });
}
