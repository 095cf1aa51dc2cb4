import { NextResponse } from 'next/server';
import { readJson } from '@/lib/http/body';
import { apiError } from '@/lib/http/errors';
import { guarded } from '@/lib/http/guard';
import { mailSettingsSchema } from '@/lib/validation/mail';
import { loadMailSettings, saveMailSettings } from '@/lib/mail/settings';

export const dynamic = 'force-dynamic';

/** GET /api/account/mail — the signed-in member's digest, followed tags and notification switches. */
export async function GET(request: Request) {
  return guarded(request, 'profile.read', async (user) => {
    const s = await loadMailSettings(user.id);
    if (!s) return apiError(401, 'Sign in to see your e-mail settings.', undefined, 'unauthenticated');
    return NextResponse.json({ ...s.settings, tagChoices: s.tagChoices });
  });
}

/** PUT /api/account/mail — changes them, for oneself only (the row is always the session's). */
export async function PUT(request: Request) {
  return guarded(request, 'profile.edit', async (user) => {
    const body = await readJson(request, mailSettingsSchema);
    if ('response' in body) return body.response;
    const out = await saveMailSettings(user.id, body.data);
    if (!out.ok) return apiError(out.status, out.message, out.field, 'invalid_input');
    const s = await loadMailSettings(user.id);
    return NextResponse.json(s?.settings ?? body.data);
  });
}
