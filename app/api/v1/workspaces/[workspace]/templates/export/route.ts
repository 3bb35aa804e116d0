import { requireAction } from '@/app/lib/authz';
import { allTemplateFields } from '@/db/templates/list-templates';
import { templatesToCsv } from '@/lib/templates/template-csv';
import { guarded } from '@/app/lib/route-handler';
import { type WorkspaceParams } from '../_shared/template-params';

/** GET …/templates/export — every template of the workspace as CSV (column set in lib/templates/csv-columns.ts). */
export async function GET(_request: Request, { params }: WorkspaceParams): Promise<Response> {
  return guarded(async () => {
    const { workspace } = await params;
    const access = await requireAction(workspace, 'template.read');
    const csv = templatesToCsv(await allTemplateFields(access.workspace.id));
    return new Response(csv, {
      headers: {
        'Content-Type': 'text/csv; charset=utf-8',
        'Content-Disposition': `attachment; filename="${access.workspace.slug}-templates.csv"`,
      },
    });
  });
}
