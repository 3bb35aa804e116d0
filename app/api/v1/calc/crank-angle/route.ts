import { parseJsonBody } from '@/app/lib/api';
import { crankAngleSchema } from '@/lib/engine/crank-angle-schema';
import { crankDegFromDropMm } from '@/lib/engine/slider-crank';

// Public calculator (PRODUCT.md §4): no session is needed, it reads and stores nothing.
// The answer is degrees from TDC, the same before and after TDC.
export async function POST(request: Request) {
  const parsed = await parseJsonBody(request, crankAngleSchema);
  if (!parsed.ok) return parsed.response;
  return Response.json({ crankDeg: crankDegFromDropMm(parsed.data) });
}
