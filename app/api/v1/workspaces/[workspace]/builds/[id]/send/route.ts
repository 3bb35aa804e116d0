import { jsonError } from '@/app/lib/api';
import { sendCustomerCopy } from '@/app/lib/customer-copy-service';
import { pdfPoolBusyResponse } from '@/app/lib/pdf-pool';
import { consumePoint, RateLimitedError } from '@/app/lib/rate-limit';
import { guarded } from '@/app/lib/route-handler';
import { buildFields } from '@/lib/builds/build-fields';
import { toFieldIssues } from '@/lib/sheet/sheet-request';
import { buildFor, type BuildParams } from '../../_shared/build-responses';
import { copyQuerySchema } from '../../_shared/copy-query';
import { dateFormatOf } from '@/app/lib/date-format';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

/**
 * POST …/builds/[id]/send?paper=A4|Letter — mails the customer's copy as a PDF attachment to the
 * record's customer e-mail (build.send), recorded on the record and in the audit log; 202 with the
 * record. Limited per workspace (app/lib/rate-limit.ts).
 */
export async function POST(incoming: Request, { params }: BuildParams): Promise<Response> {
  return guarded(incoming, {}, async (request) => {
    const { access, build } = await buildFor(params, 'build.send');
    const query = copyQuerySchema.safeParse(Object.fromEntries(new URL(request.url).searchParams));
    if (!query.success) return jsonError(400, 'Some query parameters are not valid', toFieldIssues(query.error));
    if (!build.customerEmail) {
      const message = `${buildFields.customerEmail.label} is needed to send the customer's copy: add it to the record first`;
      return jsonError(400, message, [{ path: 'customerEmail', message }]);
    }
    try {
      await consumePoint([['buildSendPerWorkspace', String(access.workspace.id)]]);
    } catch (err) {
      if (err instanceof RateLimitedError) return jsonError(429, `Too many copies sent from this workspace: ${err.message}`);
      throw err;
    }
    try {
      return Response.json({ build: await sendCustomerCopy(access, build, query.data.paper, dateFormatOf(request)) }, { status: 202 });
    } catch (err) {
      const busy = pdfPoolBusyResponse(err); // nothing was sent: the copy could not be drawn yet
      if (busy) return busy;
      throw err;
    }
  });
}
