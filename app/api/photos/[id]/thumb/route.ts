import { servePhoto } from '@/lib/photos/serve';

export const dynamic = 'force-dynamic';
export const runtime = 'nodejs';

/** GET /api/photos/:id/thumb — the thumbnail (longest side ≤ 320 px). */
export async function GET(_req: Request, { params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  return servePhoto(id, 'thumb');
}
