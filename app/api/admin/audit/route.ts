import { NextResponse, type NextRequest } from 'next/server';
import { queryObject, validationError } from '@/lib/http/errors';
import { guarded } from '@/lib/http/guard';
import { auditFilterSchema } from '@/lib/validation/moderation';
import { listAudit } from '@/lib/moderation/audit';

export const dynamic = 'force-dynamic';

/** GET /api/admin/audit — the audit log, read-only (admins). */
export async function GET(request: NextRequest) {
  return guarded(request, 'audit.read', async () => {
    const parsed = auditFilterSchema.safeParse(queryObject(request.nextUrl.searchParams));
    if (!parsed.success) return validationError(parsed.error);
    return NextResponse.json(await listAudit(parsed.data));
  });
}
