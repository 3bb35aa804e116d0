import 'server-only';
import { recordAudit } from '@/db/audit-log';
import { findBuild } from '@/db/builds/find-build';
import { insertSend } from '@/db/builds/sends';
import { db } from '@/db/knex';
import type { Build } from '@/lib/builds/build';
import type { CopyPaper } from '@/pdf/render-build-record-pdf';
import type { Access } from './authz';
import { customerCopyMail } from './emails';
import { sendMail } from './mailer';
import { renderPdf } from './pdf-pool';
import type { DateFormat } from '@/lib/format/date-format';

/** The file name of a record's customer's copy. */
export function customerCopyFileName(build: Build): string {
  return `timing-record-${build.id}.pdf`;
}

/**
 * Mails the customer's copy to the record's customer e-mail through the app's mailer, then
 * records the send on the record and in the audit log. Answers the record with the send.
 */
export async function sendCustomerCopy(access: Access, build: Build, paper: CopyPaper, dateFormat: DateFormat): Promise<Build> {
  const pdf = Buffer.from((await renderPdf({ kind: 'buildRecord', props: { build, shopName: access.workspace.name, paper, dateFormat } })).bytes);
  const engine = [build.engineDescription, build.engineNumber].filter(Boolean).join(', ') || 'as recorded';
  await sendMail(
    customerCopyMail(
      build.customerEmail,
      { shopName: access.workspace.name, customerName: build.customerName, engine, technician: build.technician?.name ?? '' },
      { filename: customerCopyFileName(build), content: pdf, contentType: 'application/pdf' },
    ),
  );
  const sentAt = new Date().toISOString();
  return db().transaction(async (trx) => {
    await insertSend(trx, { buildId: build.id, to: build.customerEmail, sentBy: access.user.id, sentAt });
    await recordAudit(
      { action: 'build-sent', actorUserId: access.user.id, workspaceId: access.workspace.id, detail: { buildId: build.id, to: build.customerEmail } },
      trx,
    );
    return (await findBuild(access.workspace.id, build.id, trx))!;
  });
}
