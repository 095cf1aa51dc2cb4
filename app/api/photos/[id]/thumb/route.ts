import { servePhoto } from '@/lib/photos/serve';

export const dynamic = 'force-dynamic';
export const runtime = 'nodejs';

/** GET /api/photos/:id/thumb — the thumbnail (longest side ≤ 320 px). */
export async function GET(request: Request, { params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  return servePhoto(request, id, 'thumb');
}
