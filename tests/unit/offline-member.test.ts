import { describe, expect, it } from 'vitest';
import {
  forgetMember,
  lastMember,
  memberWhenUnreachable,
  parseKnownMember,
  rememberMember,
} from '@/lib/offline/member';

/** localStorage as a Map: what the phone keeps between pages. */
function store() {
  const m = new Map<string, string>();
  return {
    getItem: (k: string) => m.get(k) ?? null,
    setItem: (k: string, v: string) => void m.set(k, v),
    removeItem: (k: string) => void m.delete(k),
    raw: m,
  };
}
const tamsin = { id: 7, handle: 'ferncombe_tamsin', role: 'member', units: 'US' as const };

describe('the member known offline', () => {
  it('keeps only the id, handle, role and units, and reads back only that shape', () => {
    const s = store();
    rememberMember({ ...tamsin, email: 'tamsin@ferncombe.example', token: 'x' } as typeof tamsin, s);
    expect(JSON.parse(s.raw.get('clackwater-member')!)).toEqual(tamsin);
    expect(lastMember(s)).toEqual(tamsin);
    expect(parseKnownMember('{"id":"7","handle":"a","role":"member","units":"US"}')).toBeNull();
    expect(parseKnownMember('{"id":7,"handle":"a","role":"member","units":"imperial"}')).toBeNull();
    expect(parseKnownMember('not json')).toBeNull();
    forgetMember(s);
    expect(lastMember(s)).toBeNull();
  });

  it('stands in when the session endpoint cannot be reached, and only then', async () => {
    const s = store();
    rememberMember(tamsin, s);
    const unreachable = (async () => {
      throw new TypeError('Failed to fetch');
    }) as typeof fetch;
    expect(await memberWhenUnreachable(unreachable, s)).toEqual(tamsin);
    const down = (async () => new Response('', { status: 503 })) as typeof fetch;
    expect(await memberWhenUnreachable(down, s)).toEqual(tamsin);
    // the server answers: nobody signed in (next-auth answers {} then) — a sign-out; forgotten
    const signedOut = (async () => Response.json({})) as typeof fetch;
    expect(await memberWhenUnreachable(signedOut, s)).toBeNull();
    expect(lastMember(s)).toBeNull();
    expect(await memberWhenUnreachable(unreachable, s)).toBeNull();
  });

  it('asks nothing of the server when no member is kept (a visitor’s pages)', async () => {
    let asked = 0;
    const count = (async () => {
      asked++;
      return Response.json({});
    }) as typeof fetch;
    expect(await memberWhenUnreachable(count, store())).toBeNull();
    expect(asked).toBe(0);
  });
});
