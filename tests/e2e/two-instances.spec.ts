import { spawn, type ChildProcess } from 'node:child_process';
import { test, expect } from '@playwright/test';
import { serverEnv } from '../../playwright.config';

const PORT_B = Number(process.env.E2E_PORT ?? 3100) + 17;
const B = `http://127.0.0.1:${PORT_B}`;
let server: ChildProcess | null = null;

test.beforeAll(async () => {
  test.setTimeout(90_000);
  server = spawn('node', ['scripts/server.mjs', '-p', String(PORT_B), '-H', '127.0.0.1'], {
    env: serverEnv(B) as NodeJS.ProcessEnv,
    stdio: 'ignore',
  });
  for (let i = 0; i < 120; i++) {
    const ok = await fetch(`${B}/api/health`).then(
      (r) => r.ok,
      () => false,
    );
    if (ok) return;
    await new Promise((r) => setTimeout(r, 500));
  }
  throw new Error(`the second instance did not start on ${B}`);
});
test.afterAll(() => {
  server?.kill();
});

test('two app instances on one database: a post made on one is read on the other, one session serves both, rate limits hold across both', async ({
  page,
  baseURL,
}) => {
  // a session started on instance A …
  await page.goto('/sign-in');
  const form = page.getByRole('form', { name: 'Sign in with a password' });
  await form.getByLabel('E-mail').fill('cabin@sorrelcreek.example');
  await form.getByLabel('Password').fill('lift-with-falling-water');
  await form.getByRole('button', { name: 'Sign in' }).click();
  await expect(page).toHaveURL(/\/$/);
  // … is honoured by instance B (cookies belong to the host, not the port)
  const title = `Two instances, one database ${Date.now() % 100000}`;
  const posted = await page.request.post(`${B}/api/questions`, {
    data: { title, body: 'Asked on the second instance, read on the first one.', tags: ['survey'] },
  });
  expect(posted.status()).toBe(201);
  const { url } = await posted.json();
  await page.goto(`${baseURL}${url}`);
  await expect(page.getByRole('heading', { level: 1 })).toHaveText(title);
  await page.goto(`${B}/settings`);
  await expect(page.getByLabel('Display name')).toHaveValue('Sorrel Creek Cabin');

  // password-reset requests are limited to 3 an hour per address: two on A and one on B use it up
  const email = `nobody-${Date.now()}@nowhere.example`;
  let ip = 0;
  const reset = (base: string) =>
    page.request.post(`${base}/api/account/password-reset`, {
      data: { email },
      headers: { 'x-forwarded-for': `10.77.0.${++ip}` },
    });
  expect((await reset(baseURL!)).status()).toBe(202);
  expect((await reset(baseURL!)).status()).toBe(202);
  expect((await reset(B)).status()).toBe(202);
  const refusedOnA = await reset(baseURL!);
  const refusedOnB = await reset(B);
  expect([refusedOnA.status(), refusedOnB.status()]).toEqual([429, 429]);
  expect((await refusedOnB.json()).error.message).toMatch(/Too many attempts/);
});
