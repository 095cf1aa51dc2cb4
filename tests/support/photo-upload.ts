import { NextRequest } from 'next/server';
import { POST } from '@/app/api/photos/route';
import { sessionCookie } from './act-as';

export type Part = { name: string; data: Buffer | string; type?: string };

/** POST /api/photos as a member (or signed out), the files as the browser would send them. */
export async function upload(
  parts: Part[],
  { as = 'highcrag_shepherd' as string | null, alt = [] as string[], ip = undefined as string | undefined } = {},
) {
  const form = new FormData();
  for (const p of parts)
    form.append(
      'photos',
      new File([typeof p.data === 'string' ? p.data : new Uint8Array(p.data)], p.name, {
        type: p.type ?? 'application/octet-stream',
      }),
    );
  for (const a of alt) form.append('alt', a);
  const headers: Record<string, string> = ip ? { 'x-forwarded-for': ip } : {};
  if (as) headers.cookie = await sessionCookie(as);
  return POST(new NextRequest('http://localhost/api/photos', { method: 'POST', body: form, headers }));
}
