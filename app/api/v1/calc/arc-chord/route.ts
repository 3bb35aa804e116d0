import { parseJsonBody } from '@/app/lib/api';
import { guarded } from '@/app/lib/route-handler';
import { arcChordRows } from '@/lib/engine/arc-chord-rows';
import { arcChordSchema } from '@/lib/engine/arc-chord-schema';

// Public calculator (DEVELOPERS.md, "Public pages"): no session is needed, it reads and stores nothing.
export async function POST(incoming: Request) {
  return guarded(incoming, {}, async (request) => {
    const parsed = await parseJsonBody(request, arcChordSchema);
    if (!parsed.ok) return parsed.response;
    return Response.json({ rows: arcChordRows(parsed.data) });
  });
}
