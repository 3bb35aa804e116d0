import { guarded } from '@/app/lib/route-handler';
import { listBuildRevisions } from '@/db/builds/revisions';
import { buildFor, type BuildParams } from '../../_shared/build-responses';

/** GET …/builds/[id]/revisions — the history, newest first: who, when, fields old → new (build.read). */
export async function GET(_request: Request, { params }: BuildParams): Promise<Response> {
  return guarded(async () => {
    const { build } = await buildFor(params, 'build.read');
    return Response.json({ revisions: await listBuildRevisions(build.id) });
  });
}
