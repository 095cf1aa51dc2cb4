import { NextResponse } from 'next/server';
import { readJson } from '@/lib/http/body';
import { apiError } from '@/lib/http/errors';
import { guarded } from '@/lib/http/guard';
import { unitsChoiceSchema } from '@/lib/validation/community';
import { saveUnits } from '@/lib/accounts/units';
import { UNITS_COOKIE, UNITS_COOKIE_OPTIONS } from '@/lib/units/preference';

export const dynamic = 'force-dynamic';

/**
 * PUT /api/account/units — the header's unit switch for a signed-in member: saves the
 * choice on the member's own account (never one named in the body) and sets the
 * cookie, so Settings, every page and the member's other browsers agree.
 */
export async function PUT(request: Request) {
  return guarded(request, 'profile.units', async (user) => {
    const body = await readJson(request, unitsChoiceSchema);
    if ('response' in body) return body.response;
    const { units } = body.data;
    if (!(await saveUnits(user.id, units)))
      return apiError(401, 'Sign in to save your units.', undefined, 'unauthenticated');
    const res = NextResponse.json({ units });
    res.cookies.set(UNITS_COOKIE, units, UNITS_COOKIE_OPTIONS);
    return res;
  });
}
