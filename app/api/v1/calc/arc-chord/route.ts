import { parseJsonBody } from '@/app/lib/api';
import { arcChordRows } from '@/lib/engine/arc-chord-rows';
import { arcChordSchema } from '@/lib/engine/arc-chord-schema';

// Public calculator (DEVELOPERS.md, "Public pages"): no session is needed, it reads and stores nothing.
export async function POST(request: Request) {
  const parsed = await parseJsonBody(request, arcChordSchema);
  if (!parsed.ok) return parsed.response;
  return Response.json({ rows: arcChordRows(parsed.data) });
}
