import { NextResponse } from 'next/server';
import { pingDatabase } from '@/lib/db';
import { DB_UNAVAILABLE_MESSAGE } from '@/lib/db/errors';

export const dynamic = 'force-dynamic';

/** GET /api/health — 200 when the database answers, 503 with a readable body when not. */
export async function GET() {
  try {
    const { latencyMs } = await pingDatabase();
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
