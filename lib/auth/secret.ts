import 'server-only';
import { randomBytes } from 'node:crypto';
import { mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';

/**
 * The session-signing secret: NEXTAUTH_SECRET from the environment, or for a
 * development machine one generated once into .data/auth-secret (ignored by git)
 * so sessions survive restarts and every local instance agrees.
 */
export function authSecret(): string {
  if (process.env.NEXTAUTH_SECRET) return process.env.NEXTAUTH_SECRET;
  const file = path.join(/* turbopackIgnore: true */ process.cwd(), '.data', 'auth-secret');
  try {
    return readFileSync(/* turbopackIgnore: true */ file, 'utf8').trim();
  } catch {
    const secret = randomBytes(32).toString('base64url');
    mkdirSync(path.dirname(file), { recursive: true });
    writeFileSync(/* turbopackIgnore: true */ file, secret, { mode: 0o600 });
    return secret;
  }
}
