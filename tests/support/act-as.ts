import { NextRequest } from 'next/server';
import { encode } from 'next-auth/jwt';
import { authSecret } from '@/lib/auth/secret';
import { initModels } from '@/models';
import { siteUrl } from '@/lib/site';

// eslint-disable-next-line @typescript-eslint/no-explicit-any -- handlers differ in their context types
export type Handler = (r: any, ctx: any) => Promise<Response>;

/** A next-auth session cookie for a demo member, as the app would set it at a sign-in now (with the account's session version). */
export async function sessionCookie(handle: string): Promise<string> {
  const u = (await initModels().User.findOne({ where: { handle } }))!;
  return `next-auth.session-token=${await encode({ token: { uid: u.id, role: u.role, handle, sv: u.sessionVersion }, secret: authSecret() })}`;
}

/**
 * Calls route handlers as a member (or signed out), each request from a new
 * address under `subnet` so per-address flood limits never interfere.
 */
export function actAs(subnet: string) {
  let ip = 0;
  async function raw(
    handler: Handler,
    method: string,
    url: string,
    who: string | null,
    body?: unknown,
    params: Record<string, string> = {},
    extraHeaders: Record<string, string> = {},
  ) {
    // as the site's own pages send it: JSON, from the site's origin (lib/http/request-checks.ts)
    const headers: Record<string, string> = {
      'content-type': 'application/json',
      origin: new URL(siteUrl()).origin,
      'x-forwarded-for': `${subnet}.${++ip}`,
      ...extraHeaders,
    };
    if (who) headers.cookie = await sessionCookie(who);
    return handler(
      new NextRequest(`http://localhost${url}`, {
        method,
        headers,
        body: body === undefined ? undefined : JSON.stringify(body),
      }),
      { params: Promise.resolve(params) },
    );
  }
  async function call(
    handler: Handler,
    method: string,
    url: string,
    who: string | null,
    body?: unknown,
    params: Record<string, string> = {},
    extraHeaders: Record<string, string> = {},
  ) {
    const res = await raw(handler, method, url, who, body, params, extraHeaders);
    return { status: res.status, body: await res.json() };
  }
  return { raw, call };
}
