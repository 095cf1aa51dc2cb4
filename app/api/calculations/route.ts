import { NextResponse } from 'next/server';
import { saveCalculationSchema } from '@/lib/validation/calculation';
import { apiError, serverError, validationError } from '@/lib/http/errors';
import { currentUser } from '@/lib/auth/session';
import { can, REFUSAL } from '@/lib/auth/policy';
import { saveWorkedCalculation } from '@/lib/calculations/store';
import { computeFromForm } from '@/lib/calculators';

export const dynamic = 'force-dynamic';

/**
 * POST /api/calculations — saves a worked calculation. The server recomputes the
 * result from the inputs with its own engine; a result sent by the browser is ignored.
 */
export async function POST(request: Request) {
  let body: unknown;
  try {
    body = await request.json();
  } catch {
    return apiError(400, 'the body must be JSON', undefined, 'invalid_json');
  }
  const parsed = saveCalculationSchema.safeParse(body);
  if (!parsed.success) return validationError(parsed.error);
  const user = await currentUser(request);
  if (!user) return apiError(401, REFUSAL['calculation.save'], undefined, 'unauthenticated');
  if (!can(user, 'calculation.save')) return apiError(403, REFUSAL['calculation.save'], undefined, 'forbidden');

  const computed = computeFromForm(parsed.data.tool, parsed.data.inputs);
  if (!computed.ok) return apiError(422, computed.message, computed.field ? `inputs.${computed.field}` : undefined, 'invalid_inputs');
  try {
    const saved = await saveWorkedCalculation({
      tool: parsed.data.tool,
      form: parsed.data.inputs,
      results: computed.output.results,
      engineVersion: computed.engineVersion,
      authorId: user.id,
      title: parsed.data.title,
    });
    return NextResponse.json({ id: saved.publicId, url: `/calculations/${saved.publicId}` }, { status: 201 });
  } catch (err) {
    return serverError(err);
  }
}
