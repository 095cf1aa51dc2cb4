import { NextResponse } from 'next/server';
import { apiError, serverError } from '@/lib/http/errors';
import { readJson } from '@/lib/http/body';
import { guarded } from '@/lib/http/guard';
import { addSiteVersion, SiteError } from '@/lib/sites/store';
import { planFromSurvey } from '@/lib/sites/plan';
import { siteVersionSchema } from '@/lib/validation/site';
import { unitPreferenceOf } from '@/lib/units/preference';

export const dynamic = 'force-dynamic';
type Ctx = { params: Promise<{ id: string }> };

/** POST /api/sites/:id/versions — the owner's changed survey, planned again as the next version. */
export async function POST(request: Request, { params }: Ctx) {
  const { id } = await params;
  return guarded(
    request,
    'site.edit',
    async (user) => {
      const body = await readJson(request, siteVersionSchema);
      if ('response' in body) return body.response;
      const { form, planned } = planFromSurvey(body.data.survey, unitPreferenceOf(request));
      if (!planned.ok)
        return apiError(422, planned.message, planned.field ? `survey.${planned.field}` : 'survey', 'invalid_inputs');
      try {
        const version = await addSiteVersion(user, id, {
          survey: form,
          plan: planned.output.results as unknown as Record<string, unknown>,
          engineVersion: planned.engineVersion,
        });
        return NextResponse.json({ id, version, url: `/sites/${id}?version=${version}` }, { status: 201 });
      } catch (err) {
        return err instanceof SiteError ? apiError(err.status, err.message, err.field) : serverError(err);
      }
    },
    { flood: 'calculation' },
  );
}
