import { databaseHealth } from '@/db/health';

export const dynamic = 'force-dynamic';

export async function GET() {
  const database = await databaseHealth();
  const status = database.ok ? 200 : 503;
  return Response.json({ status: database.ok ? 'ok' : 'unavailable', database }, { status });
}
