import { spawn, type ChildProcess } from 'node:child_process';
import { test, expect, request as apiRequest } from '@playwright/test';
import { serverEnv } from '../../playwright.config';
import { signIn, signedIn } from '../support/session';

/**
 * Issue 17 against the real server (scripts/server.mjs in front of Next's handler):
 * a client that rotates X-Forwarded-For is still limited by its real address; the
 * browser goes only to paths on this site after sign-in; "sign out everywhere" ends
 * the other browser's session.
 */
const PORT_C = Number(process.env.E2E_PORT ?? 3100) + 19;
const C = `http://127.0.0.1:${PORT_C}`;
let server: ChildProcess | null = null;

test.describe('rotating X-Forwarded-For', () => {
  test.beforeAll(async () => {
    test.setTimeout(90_000);
    // counts in this instance's memory, so spending this address's sign-in tries here
    // leaves the shared ones (RATE_LIMIT_STORE=mariadb) of the main instance alone
    const env = { ...serverEnv(C), RATE_LIMIT_STORE: 'memory' };
    server = spawn('node', ['scripts/server.mjs', '-p', String(PORT_C), '-H', '127.0.0.1'], {
      env: env as unknown as NodeJS.ProcessEnv,
      stdio: 'ignore',
    });
    for (let i = 0; i < 120; i++) {
      if (
        await fetch(`${C}/api/health`).then(
          (r) => r.ok,
          () => false,
        )
      )
        return;
      await new Promise((r) => setTimeout(r, 500));
    }
    throw new Error(`the third instance did not start on ${C}`);
  });
  test.afterAll(() => {
    server?.kill();
  });

  test('password sign-in is limited by the real address however the client writes X-Forwarded-For', async () => {
    test.setTimeout(90_000);
    const api = await apiRequest.newContext({ baseURL: C });
    const { csrfToken } = await (await api.get('/api/auth/csrf')).json();
    const errors: string[] = [];
    for (let i = 0; i < 31; i++) {
      const res = await api.post('/api/auth/callback/password', {
        headers: { 'x-forwarded-for': `198.51.100.${i}` },
        // a different unknown address each time: only the per-address limit can refuse
        form: {
          csrfToken,
          email: `nobody${i}@nowhere.example`,
          password: 'not the password at all',
          json: 'true',
          callbackUrl: C,
        },
      });
      const { url } = await res.json();
      errors.push(new URL(url).searchParams.get('error') ?? '(none)');
    }
    // 30 a quarter hour per address (lib/auth/rate-limit.ts; common practice, no source)
    expect(errors.slice(0, 30).every((e) => /do not match an account/.test(e))).toBe(true);
    expect(errors[30]).toMatch(/Too many attempts/);
    await api.dispose();
  });
});

test('after sign-in the browser stays on this site whatever callbackUrl says', async ({ page, baseURL }) => {
  const origin = new URL(baseURL!).origin;
  for (const cb of ['//example.invalid/x', '/%09/example.invalid/x', '/%5Cexample.invalid/x']) {
    await page.context().clearCookies();
    await page.goto(`/sign-in?callbackUrl=${cb}`);
    const form = page.getByRole('form', { name: 'Sign in with a password' });
    await form.getByLabel('E-mail').fill('tamsin@ferncombe.example');
    await form.getByLabel('Password').fill('lift-with-falling-water');
    await form.getByRole('button', { name: 'Sign in' }).click();
    await expect(page).toHaveURL(`${origin}/`);
  }
});

test('"sign out everywhere" in settings signs out the other browser too', async ({ browser, page }) => {
  const other = await signedIn(browser, 'builds@ironwheel.example');
  await signIn(page, 'builds@ironwheel.example');
  await page.goto('/settings');
  await page.getByRole('button', { name: 'Sign out everywhere' }).click();
  await expect(page).toHaveURL(/\/sign-in/);
  await other.goto('/settings');
  await expect(other.getByRole('link', { name: 'Sign in' }).first()).toBeVisible();
  await expect(other.getByLabel('Display name')).toHaveCount(0);
  await other.context().close();
});
