import type { z } from 'zod';
import { apiError, validationError } from './errors';
import { crossSiteRefusal, isJsonContentType, jsonBodyLimit, readBodyText } from './request-checks';
import { BROKEN_TEXT_MESSAGE, firstBrokenText } from '@/lib/validation/text';

/**
 * Reads a JSON body against a schema: the parsed value, or the response to answer.
 * In order: a write from another site (403), a body not declared as JSON (415: a
 * form posted as text/plain must not be read as JSON), one over the route's size
 * limit (413, before or while reading), not JSON (400), a broken character in any
 * key or string (400 naming it), then the schema (400 naming the field).
 */
export async function readJson<S extends z.ZodType>(
  request: Request,
  schema: S,
): Promise<{ data: z.output<S> } | { response: Response }> {
  const crossSite = crossSiteRefusal(request);
  if (crossSite) return { response: crossSite };
  if (!isJsonContentType(request)) {
    return {
      response: apiError(
        415,
        'send the body as JSON, with Content-Type: application/json',
        undefined,
        'unsupported_media_type',
      ),
    };
  }
  const read = await readBodyText(request, jsonBodyLimit(request));
  if ('response' in read) return read;
  let body: unknown;
  try {
    body = JSON.parse(read.text);
  } catch {
    return { response: apiError(400, 'the body must be JSON', undefined, 'invalid_json') };
  }
  const broken = firstBrokenText(body);
  if (broken)
    return {
      response: apiError(
        400,
        `${broken.join('.') || 'the body'} ${BROKEN_TEXT_MESSAGE}`,
        broken.join('.') || undefined,
        'invalid_input',
      ),
    };
  const parsed = schema.safeParse(body);
  return parsed.success ? { data: parsed.data } : { response: validationError(parsed.error) };
}
