import { jsonError } from '@/app/lib/api';
import { customerCopyFileName } from '@/app/lib/customer-copy-service';
import { pdfPoolBusyResponse, renderPdf } from '@/app/lib/pdf-pool';
import { guarded } from '@/app/lib/route-handler';
import { toFieldIssues } from '@/lib/sheet/sheet-request';
import { buildFor, type BuildParams } from '../../_shared/build-responses';
import { copyQuerySchema } from '../../_shared/copy-query';
import { dateFormatOf } from '@/app/lib/date-format';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

/** GET …/builds/[id]/record?format=pdf&paper=A4|Letter — the customer's copy (build.read: viewers may download it). */
export async function GET(request: Request, { params }: BuildParams): Promise<Response> {
  return guarded(async () => {
    const { access, build } = await buildFor(params, 'build.read');
    const query = copyQuerySchema.safeParse(Object.fromEntries(new URL(request.url).searchParams));
    if (!query.success) return jsonError(400, 'Some query parameters are not valid', toFieldIssues(query.error));
    let pdf;
    try {
      pdf = await renderPdf({ kind: 'buildRecord', props: { build, shopName: access.workspace.name, paper: query.data.paper, dateFormat: dateFormatOf(request) } });
    } catch (error) {
      const busy = pdfPoolBusyResponse(error);
      if (busy) return busy;
      throw error;
    }
    return new Response(pdf.bytes as Uint8Array<ArrayBuffer>, {
      headers: {
        'Content-Type': 'application/pdf',
        'Content-Disposition': `attachment; filename="${customerCopyFileName(build)}"`,
        'Cache-Control': 'no-store',
        'X-Content-Type-Options': 'nosniff',
      },
    });
  });
}
