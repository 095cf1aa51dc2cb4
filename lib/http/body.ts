import type { z } from 'zod';
import { apiError, validationError } from './errors';

/** Reads a JSON body against a schema: the parsed value, or the 400 to answer. */
export async function readJson<S extends z.ZodType>(request: Request, schema: S): Promise<{ data: z.output<S> } | { response: Response }> {
  let body: unknown;
  try {
    body = await request.json();
  } catch {
    return { response: apiError(400, 'the body must be JSON', undefined, 'invalid_json') };
  }
  const parsed = schema.safeParse(body);
  return parsed.success ? { data: parsed.data } : { response: validationError(parsed.error) };
}
