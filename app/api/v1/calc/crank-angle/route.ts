import { parseJsonBody } from '@/app/lib/api';
import { guarded } from '@/app/lib/route-handler';
import { crankAngleSchema } from '@/lib/engine/crank-angle-schema';
import { crankAnglesFromDropMm } from '@/lib/engine/offset-slider-crank';

// Public calculator (DEVELOPERS.md, "Public pages"): no session is needed, it reads and stores nothing.
// Answers { crankDeg, crankDegATDC, crankDegBTDC }: degrees after TDC going down and before TDC
// coming up. Without a pin offset all three are equal; crankDeg is always the down-stroke angle.
export async function POST(incoming: Request) {
  return guarded(incoming, {}, async (request) => {
    const parsed = await parseJsonBody(request, crankAngleSchema);
    if (!parsed.ok) return parsed.response;
    return Response.json(crankAnglesFromDropMm(parsed.data));
  });
}
