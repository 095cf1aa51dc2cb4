import { NextResponse } from 'next/server';
import { getSequelize } from '@/lib/db';
import { initModels } from '@/models';
import type { User } from '@/models/User';
import { readJson } from '@/lib/http/body';
import { apiError } from '@/lib/http/errors';
import { guarded } from '@/lib/http/guard';
import { accountSettingsSchema } from '@/lib/validation/community';
import { displayNameSchema } from '@/lib/validation/account';
import { UNITS_COOKIE, UNITS_COOKIE_OPTIONS } from '@/lib/units/preference';

export const dynamic = 'force-dynamic';

function settingsView(u: User) {
  return {
    handle: u.handle,
    email: u.email,
    role: u.role,
    displayName: u.displayName,
    region: u.region ?? '',
    bio: u.bio ?? '',
    units: u.units,
  };
}

/** GET /api/account/settings — the signed-in member's own settings. */
export async function GET(request: Request) {
  return guarded(request, 'profile.read', async (user) => {
    const row = await initModels().User.findByPk(user.id);
    if (!row) return apiError(401, 'Sign in to see your settings.', undefined, 'unauthenticated');
    return NextResponse.json(settingsView(row));
  });
}

/**
 * PUT /api/account/settings — display name, region, bio and units, for oneself only:
 * the row changed is always the session's own, never one named in the body.
 */
export async function PUT(request: Request) {
  return guarded(request, 'profile.edit', async (user) => {
    // role words in a display name are the holder's own role's only
    const body = await readJson(request, accountSettingsSchema.extend({ displayName: displayNameSchema(user.role) }));
    if ('response' in body) return body.response;
    const { displayName, region, bio, units } = body.data;
    const { User } = initModels();
    const saved = await getSequelize().transaction(async (transaction) => {
      const row = await User.findByPk(user.id, { transaction, lock: transaction.LOCK.UPDATE });
      if (!row) return null;
      return row.update({ displayName, region: region || null, bio: bio || null, units }, { transaction });
    });
    if (!saved) return apiError(401, 'Sign in to change your settings.', undefined, 'unauthenticated');
    const res = NextResponse.json(settingsView(saved));
    // the one unit preference: saved above, and the cookie every page and the header's switch read
    res.cookies.set(UNITS_COOKIE, units, UNITS_COOKIE_OPTIONS);
    return res;
  });
}
