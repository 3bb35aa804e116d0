import { requireAction } from '@/app/lib/authz';
import { guarded } from '@/app/lib/route-handler';
import { allBuilds } from '@/db/builds/list-builds';
import { buildsToCsv } from '@/lib/builds/build-csv';
import type { WorkspaceParams } from '../_shared/build-responses';

/** GET …/builds/export — every build record of the workspace as CSV, results included (build.read). */
export async function GET(_request: Request, { params }: WorkspaceParams): Promise<Response> {
  return guarded(async () => {
    const access = await requireAction((await params).workspace, 'build.read');
    return new Response(buildsToCsv(await allBuilds(access.workspace.id)), {
      headers: {
        'Content-Type': 'text/csv; charset=utf-8',
        'Content-Disposition': `attachment; filename="${access.workspace.slug}-builds.csv"`,
        'Cache-Control': 'no-store',
      },
    });
  });
}
