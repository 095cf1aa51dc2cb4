import { NextResponse, type NextRequest } from 'next/server';
import { apiError, serverError } from '@/lib/http/errors';
import { readJson } from '@/lib/http/body';
import { guarded } from '@/lib/http/guard';
import { currentUser } from '@/lib/auth/session';
import { loadSite, SiteError, updateSite } from '@/lib/sites/store';
import { updateSiteSchema } from '@/lib/validation/site';
import { siteThreadsChanged } from '@/lib/sites/links';

export const dynamic = 'force-dynamic';
type Ctx = { params: Promise<{ id: string }> };

const refusal = (err: unknown) =>
  err instanceof SiteError ? apiError(err.status, err.message, err.field) : serverError(err);

/** GET /api/sites/:id[?version=N] — a site as the caller may see it: a private one its owner only. */
export async function GET(request: NextRequest, { params }: Ctx) {
  const { id } = await params;
  const v = request.nextUrl.searchParams.get('version');
  const version = v === null ? undefined : Number(v);
  if (version !== undefined && !(Number.isInteger(version) && version > 0))
    return apiError(400, 'version must be a whole number from 1', 'version');
  try {
    const site = await loadSite(await currentUser(request), id, version);
    // a private site is the owner's: never for a shared cache
    return NextResponse.json(site, { headers: { 'Cache-Control': 'private, no-store' } });
  } catch (err) {
    return refusal(err);
  }
}

/** PATCH /api/sites/:id — the owner renames the site or changes who may see it. */
export async function PATCH(request: Request, { params }: Ctx) {
  const { id } = await params;
  return guarded(request, 'site.edit', async (user) => {
    const body = await readJson(request, updateSiteSchema);
    if ('response' in body) return body.response;
    try {
      await updateSite(user, id, body.data);
      await siteThreadsChanged(id);
      return NextResponse.json({ id });
    } catch (err) {
      return refusal(err);
    }
  });
}
