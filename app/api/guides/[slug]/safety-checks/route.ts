import { NextResponse } from 'next/server';
import { readGuideFile } from '@/lib/guides/content';
import { listSafetyChecks, safetyStatus } from '@/lib/guides/safety';
import { apiError, serverError } from '@/lib/http/errors';

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
