import { NextResponse } from 'next/server';
import { getSequelize } from '@/lib/db';
import { initModels } from '@/models';
import { readGuideFile } from '@/lib/guides/content';
import { listSafetyChecks, safetyStatus } from '@/lib/guides/safety';
import { readJson } from '@/lib/http/body';
import { apiError, serverError } from '@/lib/http/errors';
import { guarded } from '@/lib/http/guard';
import { safetyCheckSchema } from '@/lib/validation/community';

export const dynamic = 'force-dynamic';

/** GET /api/guides/:slug/safety-checks — the guide's status and its history of checks. */
export async function GET(_req: Request, { params }: { params: Promise<{ slug: string }> }) {
  const { slug } = await params;
  const guide = readGuideFile(slug);
  if (!guide) return apiError(404, `no guide called ${slug}`, 'slug', 'not_found');
  try {
    const checks = await listSafetyChecks(slug, guide.hash);
    return NextResponse.json({ slug, hash: guide.hash, status: safetyStatus(checks), checks });
  } catch (err) {
    return serverError(err);
  }
}

/**
 * POST /api/guides/:slug/safety-checks — an expert records a safety check. It is tied
 * to the hash of the guide file as the server reads it now; a hash from the browser
 * is never used, so a check always names the text the expert was shown.
 */
export async function POST(request: Request, { params }: { params: Promise<{ slug: string }> }) {
  const { slug } = await params;
  return guarded(request, 'safetyCheck.record', async (user) => {
    const guide = readGuideFile(slug);
    if (!guide) return apiError(404, `no guide called ${slug}`, 'slug', 'not_found');
    const body = await readJson(request, safetyCheckSchema);
    if ('response' in body) return body.response;
    const { SafetyCheck } = initModels();
    const check = await getSequelize().transaction((transaction) =>
      SafetyCheck.create(
        {
          guideSlug: slug,
          contentHash: guide.hash,
          checkedText: guide.raw,
          expertId: user.id,
          verdict: body.data.verdict,
          notes: body.data.notes || null,
        },
        { transaction },
      ),
    );
    return NextResponse.json(
      {
        id: check.id,
        verdict: check.verdict,
        notes: check.notes,
        expert: { handle: user.handle, displayName: user.displayName },
        checkedAt: check.createdAt.toISOString(),
        current: true,
        checkedVersionUpdated: guide.meta.updated,
        hasText: true,
      },
      { status: 201 },
    );
  });
}
