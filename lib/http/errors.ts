import { NextResponse } from 'next/server';
import type { z } from 'zod';
import { DB_UNAVAILABLE_MESSAGE, isDatabaseUnavailable } from '@/lib/db/errors';

/** The one error shape every API route answers with. */
export interface ApiErrorBody {
  error: { field?: string; message: string; code?: string };
}

export function apiError(status: number, message: string, field?: string, code?: string) {
  const body: ApiErrorBody = { error: { message, ...(field ? { field } : {}), ...(code ? { code } : {}) } };
  return NextResponse.json(body, { status });
}

/** First issue of a failed zod parse as a 400 naming the field. */
export function validationError(error: z.ZodError) {
  const issue = error.issues[0];
  const field = issue?.path.join('.') || undefined;
  return apiError(400, issue?.message ?? 'invalid input', field, 'invalid_input');
}

/** Reads URLSearchParams into a plain object for a zod schema (last value wins). */
export function queryObject(params: URLSearchParams): Record<string, string> {
  return Object.fromEntries(params.entries());
}

/**
 * Turns an unexpected failure into a readable response: 503 when the database is
 * down, 500 otherwise, never a stack trace. The detail goes to the server log.
 */
export function serverError(err: unknown) {
  if (isDatabaseUnavailable(err)) {
    return apiError(503, DB_UNAVAILABLE_MESSAGE, undefined, 'database_unavailable');
  }
  console.error(err);
  return apiError(500, 'Something went wrong on our side. Please try again.', undefined, 'internal');
}
