import { NextResponse } from 'next/server';
import { pingDatabaseDirect } from '@/lib/db/health';
import { DB_UNAVAILABLE_MESSAGE } from '@/lib/db/errors';

export const dynamic = 'force-dynamic';

/**
 * GET /api/health — 200 when the database answers, 503 with a readable body when not.
 * It pings on its own connection, so a busy pool cannot make it slow (lib/db/health.ts).
 */
export async function GET() {
  try {
    const { latencyMs } = await pingDatabaseDirect();
    return NextResponse.json({ status: 'ok', database: { state: 'up', latencyMs } });
  } catch (err) {
    const detail = err instanceof Error ? err.message.split('\n')[0] : String(err);
    console.error(`health: database unavailable: ${detail}`);
    return NextResponse.json(
      { status: 'unavailable', database: { state: 'down', message: DB_UNAVAILABLE_MESSAGE } },
      { status: 503, headers: { 'Retry-After': '30' } },
    );
  }
}
