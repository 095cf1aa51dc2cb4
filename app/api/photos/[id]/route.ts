import { servePhoto } from '@/lib/photos/serve';

export const dynamic = 'force-dynamic';
export const runtime = 'nodejs';

/** GET /api/photos/:id — the web-size copy (longest side ≤ 1600 px). */
export async function GET(request: Request, { params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  return servePhoto(request, id, 'web');
}
