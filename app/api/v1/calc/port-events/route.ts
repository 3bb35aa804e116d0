import { parseJsonBody } from '@/app/lib/api';
import { guarded } from '@/app/lib/route-handler';
import { portEvents } from '@/lib/engine/port-events';
import { portEventsSchema } from '@/lib/engine/port-events-schema';

// Public calculator (DEVELOPERS.md, "Public pages"): no session is needed, it reads and stores nothing.
// Every port is taken as opened by the piston crown; a port that never opens has null angles and a note.
export async function POST(incoming: Request) {
  return guarded(incoming, {}, async (request) => {
    const parsed = await parseJsonBody(request, portEventsSchema);
    if (!parsed.ok) return parsed.response;
    return Response.json(portEvents(parsed.data));
  });
}
