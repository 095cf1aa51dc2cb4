import { NextResponse } from 'next/server';
import { saveCalculationSchema } from '@/lib/validation/calculation';
import { readJson } from '@/lib/http/body';
import { apiError } from '@/lib/http/errors';
import { guarded } from '@/lib/http/guard';
import { keepToolFields } from '@/lib/calculations/store';
import { saveSiteCalculation } from '@/lib/sites/links';
import { calculatorInputNames, computeFromForm } from '@/lib/calculators';
import { unitPreferenceOf } from '@/lib/units/preference';

export const dynamic = 'force-dynamic';

/**
 * POST /api/calculations — saves a worked calculation. The server recomputes the
 * result from the inputs with its own engine; a result sent by the browser is ignored,
 * and so is any input the calculator does not have. With `siteId`, the calculation is
 * linked to the caller's own site (checked in the same transaction as the save).
 */
export async function POST(request: Request) {
  return guarded(
    request,
    'calculation.save',
    async (user) => {
      const body = await readJson(request, saveCalculationSchema);
      if ('response' in body) return body.response;
      const { tool, title } = body.data;
      const form = keepToolFields(body.data.inputs, calculatorInputNames(tool));
      // a refusal names its numbers in the reader's units, as the card beside the form does
      const computed = computeFromForm(tool, form, unitPreferenceOf(request));
      if (!computed.ok)
        return apiError(
          422,
          computed.message,
          computed.field ? `inputs.${computed.field}` : undefined,
          'invalid_inputs',
        );
      const saved = await saveSiteCalculation(user, body.data.siteId, {
        tool,
        form,
        results: computed.output.results,
        engineVersion: computed.engineVersion,
        authorId: user.id,
        title,
      });
      return NextResponse.json({ id: saved.publicId, url: `/calculations/${saved.publicId}` }, { status: 201 });
    },
    { flood: 'calculation' },
  );
}
