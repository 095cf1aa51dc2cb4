import { z } from 'zod';

const email = z
  .string({ error: 'email is required' })
  .trim()
  .toLowerCase()
  .max(254, 'email must be at most 254 characters')
  .pipe(z.email({ error: 'email must be an e-mail address like name@example.org' }));

export const signUpSchema = z.object({
  email,
  password: z.string({ error: 'password is required' }),
  handle: z
    .string({ error: 'handle is required' })
    .trim()
    .regex(/^[a-z0-9_]{3,30}$/, 'handle must be 3–30 lower-case letters, digits or underscores'),
  displayName: z.string({ error: 'displayName is required' }).trim().min(2, 'displayName must be at least 2 characters').max(80, 'displayName must be at most 80 characters'),
});

export const emailOnlySchema = z.object({ email });

export const tokenSchema = z.object({ token: z.string({ error: 'token is required' }).min(20, 'token is not valid').max(100, 'token is not valid') });

export const newPasswordSchema = tokenSchema.extend({ password: z.string({ error: 'password is required' }) });
