import { beforeAll, describe, expect, it } from 'vitest';
import { initModels } from '@/models';
import { authOptions } from '@/lib/auth/options';
import { freshDemoDatabase } from '../support/db';
import { NextRequest } from 'next/server';
import { siteUrl } from '@/lib/site';
import { actAs, sessionCookie } from '../support/act-as';
import { POST as saveCalculation } from '@/app/api/calculations/route';
import { PUT as putUnits } from '@/app/api/account/units/route';

const { raw, call } = actAs('10.77.3');
const unitsOf = async (handle: string) => (await initModels().User.findOne({ where: { handle } }))!.units;

describe('PUT /api/account/units: the header’s switch saves one preference', () => {
  beforeAll(freshDemoDatabase);

  it('needs a session and sets no cookie without one', async () => {
    const res = await raw(putUnits, 'PUT', '/api/account/units', null, { units: 'metric' });
    expect(res.status).toBe(401);
    expect(res.headers.get('set-cookie')).toBeNull();
  });

  it('refuses a unit system it does not know, naming the field, and changes nothing', async () => {
    const before = await unitsOf('ferncombe_tamsin');
    const res = await call(putUnits, 'PUT', '/api/account/units', 'ferncombe_tamsin', { units: 'imperial' });
    expect(res.status).toBe(400);
    expect(res.body.error.field).toBe('units');
    expect(await unitsOf('ferncombe_tamsin')).toBe(before);
  });

  it('saves on the caller’s own account only, and sets the cookie', async () => {
    const shepherd = await unitsOf('highcrag_shepherd');
    const other = await initModels().User.findOne({ where: { handle: 'highcrag_shepherd' } });
    const res = await raw(putUnits, 'PUT', '/api/account/units', 'ferncombe_tamsin', {
      units: 'metric',
      // the session decides whose preference this is, never the body
      id: other!.id,
      handle: 'highcrag_shepherd',
    });
    expect(res.status).toBe(200);
    expect(await res.json()).toEqual({ units: 'metric' });
    expect(res.headers.get('set-cookie')).toMatch(/cw_units=metric;.*Path=\//i);
    expect(await unitsOf('ferncombe_tamsin')).toBe('metric');
    expect(await unitsOf('highcrag_shepherd')).toBe(shepherd);
    // saving the same choice again is still a success, not "account gone"
    const again = await call(putUnits, 'PUT', '/api/account/units', 'ferncombe_tamsin', { units: 'metric' });
    expect(again.status).toBe(200);
  });

  it('the session carries the saved choice, read fresh, so another browser takes it up', async () => {
    // what /api/auth/session runs on every read: the jwt callback on the cookie's token, then the session callback
    const session = async () => {
      const u = (await initModels().User.findOne({ where: { handle: 'ferncombe_tamsin' } }))!;
      const cookieToken = { uid: u.id, role: u.role, handle: u.handle, sv: u.sessionVersion };
      const token = await authOptions.callbacks!.jwt!({ token: cookieToken } as never);
      const s = await authOptions.callbacks!.session!({ session: { user: {}, expires: '' }, token } as never);
      return s as { user?: { units?: string } };
    };
    expect((await session()).user?.units).toBe('metric');
    await call(putUnits, 'PUT', '/api/account/units', 'ferncombe_tamsin', { units: 'US' });
    expect((await session()).user?.units).toBe('US');
  });
});

describe('an API refusal shown in a form names its numbers in the reader’s units', () => {
  beforeAll(freshDemoDatabase);

  const save = async (units: string) => {
    const res = await saveCalculation(
      new NextRequest(`${siteUrl()}/api/calculations`, {
        method: 'POST',
        headers: {
          'content-type': 'application/json',
          origin: new URL(siteUrl()).origin,
          'x-forwarded-for': '10.77.4.1',
          cookie: `${await sessionCookie('ferncombe_tamsin')}; cw_units=${units}`,
        },
        body: JSON.stringify({
          tool: 'yield-estimate',
          inputs: { fall: '400 ft', lift: '900 ft', driveFlow: '2 gpm' },
        }),
      }),
    );
    return { status: res.status, body: (await res.json()) as { error: { field?: string; message: string } } };
  };

  it('a fall past 100 m is refused in feet for a US reader, in metres for a metric one', async () => {
    const us = await save('US');
    expect(us.status).toBe(422);
    expect(us.body.error.field).toBe('inputs.fall');
    // 100 m = 328.08 ft (1 ft = 0.3048 m, NIST SP 811, 2008), three figures
    expect(us.body.error.message).toBe('Fall (supply head): must be a number greater than 0 ft and at most 328 ft');
    const metric = await save('metric');
    expect(metric.body.error.message).toBe('Fall (supply head): must be a number greater than 0 m and at most 100 m');
  });
});
