import { parseJsonBody } from '@/app/lib/api';
import { guarded } from '@/app/lib/route-handler';
import { offsetPistonDropMm } from '@/lib/engine/offset-slider-crank';
import { pistonDropSchema } from '@/lib/engine/piston-drop-schema';

// Public calculator (DEVELOPERS.md, "Public pages"): no session is needed, it reads and stores nothing.
// crankDeg is 0–360 in crank order from piston TDC (x° BTDC = 360 − x); pinOffsetMm is optional
// (0 = centred pin, positive toward the side the crank pin swings to just after TDC).
export async function POST(incoming: Request) {
  return guarded(incoming, {}, async (request) => {
    const parsed = await parseJsonBody(request, pistonDropSchema);
    if (!parsed.ok) return parsed.response;
    const { strokeMm, rodMm, crankDeg, pinOffsetMm } = parsed.data;
    return Response.json({ dropMm: offsetPistonDropMm({ strokeMm, rodMm, crankDeg, pinOffsetMm }) });
  });
}
