import { NextResponse } from 'next/server';
import { apiError, serverError } from '@/lib/http/errors';
import { findWorkedCalculation } from '@/lib/calculations/store';
import { computeFromForm, resultsDiffer } from '@/lib/calculators';

export const dynamic = 'force-dynamic';

/** GET /api/calculations/:id — the saved calculation, recomputed with the current engine. */
export async function GET(_req: Request, { params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  try {
    const saved = await findWorkedCalculation(id);
    if (!saved) return apiError(404, 'no worked calculation with that id', 'id', 'not_found');
    const now = computeFromForm(saved.tool, saved.inputs as Record<string, string>);
    return NextResponse.json({
      id: saved.publicId,
      tool: saved.tool,
      title: saved.title,
      inputs: saved.inputs,
      saved: { results: saved.results, engineVersion: saved.engineVersion, at: saved.createdAt.toISOString() },
      current: now.ok ? { results: now.output.results, engineVersion: now.engineVersion } : { error: now.message },
      changed: now.ok ? resultsDiffer(saved.results, now.output.results) : true,
    });
  } catch (err) {
    return serverError(err);
  }
}
