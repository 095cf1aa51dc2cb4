import { NextResponse } from 'next/server';
import { apiError } from '@/lib/http/errors';
import { readJson } from '@/lib/http/body';
import { guarded } from '@/lib/http/guard';
import { addSiteVersion, SiteError } from '@/lib/sites/store';
import { planFromSurvey } from '@/lib/sites/plan';
import { siteVersionSchema } from '@/lib/validation/site';
import { unitPreferenceOf } from '@/lib/units/preference';
import { idempotencyKeyOf, once } from '@/lib/http/idempotency';

export const dynamic = 'force-dynamic';
type Ctx = { params: Promise<{ id: string }> };

/** POST /api/sites/:id/versions — the owner's changed survey, planned again as the next version. */
export async function POST(request: Request, { params }: Ctx) {
  const { id } = await params;
  return guarded(
    request,
    'site.edit',
    async (user) => {
      const key = idempotencyKeyOf(request);
      const body = await readJson(request, siteVersionSchema);
      if ('response' in body) return body.response;
      const { form, planned } = planFromSurvey(body.data.survey, unitPreferenceOf(request));
      if (!planned.ok)
        return apiError(422, planned.message, planned.field ? `survey.${planned.field}` : 'survey', 'invalid_inputs');
      try {
        // the site is part of what was sent: one key for two sites' surveys is a reused key
        const out = await once(user.id, 'site.version', key, { id, ...body.data }, async (transaction) => {
          const version = await addSiteVersion(
            user,
            id,
            {
              survey: form,
              plan: planned.output.results as unknown as Record<string, unknown>,
              engineVersion: planned.engineVersion,
            },
            transaction,
          );
          return { status: 201, body: { id, version, url: `/sites/${id}?version=${version}` } };
        });
        return NextResponse.json(out.body, { status: out.status });
      } catch (err) {
        // anything else (a reused Idempotency-Key among them) is guarded()'s to answer
        if (err instanceof SiteError) return apiError(err.status, err.message, err.field);
        throw err;
      }
    },
    { flood: 'calculation' },
  );
}
