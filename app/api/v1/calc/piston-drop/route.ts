import { parseJsonBody } from '@/app/lib/api';
import { pistonDropSchema } from '@/lib/engine/piston-drop-schema';
import { pistonDropMm } from '@/lib/engine/slider-crank';

// Public calculator (PRODUCT.md §4): no session is needed, it reads and stores nothing.
export async function POST(request: Request) {
  const parsed = await parseJsonBody(request, pistonDropSchema);
  if (!parsed.ok) return parsed.response;
  const { strokeMm, rodMm, crankDeg } = parsed.data;
  return Response.json({ dropMm: pistonDropMm({ strokeMm, rodMm, crankDeg }) });
}
