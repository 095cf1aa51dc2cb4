import { NextResponse } from 'next/server';
import { apiError } from '@/lib/http/errors';
import { readJson } from '@/lib/http/body';
import { guarded, idParam } from '@/lib/http/guard';
import { postAnswer } from '@/lib/questions/posts';
import { answerSchema } from '@/lib/validation/question';
import { keepToolFields } from '@/lib/calculations/store';
import { calculatorInputNames, computeFromForm } from '@/lib/calculators';
import { unitPreferenceOf } from '@/lib/units/preference';

export const dynamic = 'force-dynamic';

/** POST /api/questions/:id/answers — an answer, optionally with a worked calculation: one saved
 * before (`calculationId`) or one from the answer form (`calculation`), saved with it. */
export async function POST(request: Request, { params }: { params: Promise<{ id: string }> }) {
  const id = idParam((await params).id);
  return guarded(
    request,
    'answer.post',
    async (user) => {
      if (!id) return apiError(400, 'id must be a question number', 'id');
      const body = await readJson(request, answerSchema);
      if ('response' in body) return body.response;
      const { calculation, ...answer } = body.data;
      let newCalculation;
      if (calculation) {
        // recomputed here as POST /api/calculations does: a result sent by the browser is never stored
        const form = keepToolFields(calculation.inputs, calculatorInputNames(calculation.tool));
        const computed = computeFromForm(calculation.tool, form, unitPreferenceOf(request));
        if (!computed.ok)
          return apiError(
            422,
            computed.message,
            computed.field ? `calculation.inputs.${computed.field}` : 'calculation',
            'invalid_inputs',
          );
        newCalculation = {
          tool: calculation.tool,
          form,
          results: computed.output.results,
          engineVersion: computed.engineVersion,
        };
      }
      const a = await postAnswer(user, id, answer, newCalculation);
      return NextResponse.json({ id: a.id }, { status: 201 });
    },
    { flood: 'post' },
  );
}
