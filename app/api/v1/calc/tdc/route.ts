import { parseJsonBody } from '@/app/lib/api';
import { guarded } from '@/app/lib/route-handler';
import { tdcFromStops } from '@/lib/engine/tdc-from-stops';
import { tdcSchema } from '@/lib/engine/tdc-schema';

// Public calculator (DEVELOPERS.md, "Public pages"): no session is needed, it reads and stores nothing.
export async function POST(incoming: Request) {
  return guarded(incoming, {}, async (request) => {
    const parsed = await parseJsonBody(request, tdcSchema);
    if (!parsed.ok) return parsed.response;
    return Response.json(tdcFromStops(parsed.data));
  });
}
