import { NextResponse } from 'next/server';
import { saveSiteSchema } from '@/lib/validation/site';
import { readJson } from '@/lib/http/body';
import { apiError } from '@/lib/http/errors';
import { guarded } from '@/lib/http/guard';
import { createSite, SiteError } from '@/lib/sites/store';
import { planFromSurvey } from '@/lib/sites/plan';
import { unitPreferenceOf } from '@/lib/units/preference';
import { idempotencyKeyOf, once } from '@/lib/http/idempotency';

export const dynamic = 'force-dynamic';

/**
 * POST /api/sites — saves a planned site, private to its owner. The server plans the
 * survey itself; a survey the planner refuses is a 422 naming the input.
 */
export async function POST(request: Request) {
  return guarded(
    request,
    'site.save',
    async (user) => {
      const key = idempotencyKeyOf(request);
      const body = await readJson(request, saveSiteSchema);
      if ('response' in body) return body.response;
      const { form, planned } = planFromSurvey(body.data.survey, unitPreferenceOf(request));
      if (!planned.ok)
        return apiError(422, planned.message, planned.field ? `survey.${planned.field}` : 'survey', 'invalid_inputs');
      try {
        // a survey saved at the water and sent again after a lost answer is one site
        const out = await once(user.id, 'site.create', key, body.data, async (transaction) => {
          const site = await createSite(
            user,
            {
              name: body.data.name,
              survey: form,
              plan: planned.output.results as unknown as Record<string, unknown>,
              engineVersion: planned.engineVersion,
            },
            transaction,
          );
          return { status: 201, body: { id: site.publicId, url: `/sites/${site.publicId}` } };
        });
        return NextResponse.json(out.body, { status: out.status });
      } catch (err) {
        if (err instanceof SiteError) return apiError(err.status, err.message, err.field);
        throw err;
      }
    },
    { flood: 'calculation' },
  );
}
