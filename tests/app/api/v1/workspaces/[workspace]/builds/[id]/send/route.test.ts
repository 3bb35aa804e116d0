import { beforeEach, describe, expect, it, vi } from 'vitest';
import { auditOf } from '@/db/audit-log';
import { consumePoint, resetAllLimits } from '@/app/lib/rate-limit';
import { actAs } from '@/tests/support/session';
import { useAccessWorldPerTest, useMailFakeForFile } from '@/tests/support/route-test-hooks';
import { readPdfText } from '@/tests/pdf/read-pdf-text';
import { BUILD_SAMPLE, buildApi } from '@/tests/app/api/v1/workspaces/[workspace]/builds/builds-support';

vi.mock('@/app/lib/session', () => import('@/tests/support/session'));

const mail = useMailFakeForFile();
const world = useAccessWorldPerTest();
let ws: string;
beforeEach(async () => {
  ws = world.shop.slug;
  await resetAllLimits();
  await fetch(`http://127.0.0.1:${mail.httpPort}/messages`, { method: 'DELETE' });
});

async function created(body: unknown = BUILD_SAMPLE) {
  actAs(world.users.technician.id);
  return (await (await buildApi.create(ws, body)).json()).build;
}

describe('customer’s copy: download and send', () => {
  it('downloads the PDF for a viewer, read back by pdf-parse: one page with the customer and the timing', async () => {
    const build = await created();
    actAs(world.users.viewer.id);
    const response = await buildApi.record(ws, build.id);
    expect(response.status).toBe(200);
    expect(response.headers.get('content-type')).toBe('application/pdf');
    expect(response.headers.get('content-disposition')).toBe(`attachment; filename="timing-record-${build.id}.pdf"`);
    const { text, pageCount } = await readPdfText(new Uint8Array(await response.arrayBuffer()));
    expect(pageCount).toBe(1);
    expect(text).toContain('World Shop');
    expect(text).toContain(BUILD_SAMPLE.customerName);
    // 18° BTDC = 1.218 mm with stroke 40 / rod 80 (Heywood eq. 2.5).
    expect(text.replace(/\s+/g, ' ')).toContain('18.0° BTDC = 1.22 mm BTDC');
    expect((await buildApi.record(ws, build.id, '?format=svg')).status).toBe(400);
  });

  it('mails exactly one message to the customer with the PDF attached, and records who sent it when', async () => {
    const build = await created();
    const response = await buildApi.send(ws, build.id);
    expect(response.status).toBe(202);
    const sent = (await response.json()).build;
    expect(sent.sends).toHaveLength(1);
    expect(sent.sends[0]).toMatchObject({ to: BUILD_SAMPLE.customerEmail, sentBy: { name: 'World technician' } });
    expect(sent.sends[0].sentAt).toMatch(/^\d{4}-\d{2}-\d{2}T/);
    expect(sent.version).toBe(build.version); // a send is not an edit

    const inbox = await mail.inbox(BUILD_SAMPLE.customerEmail);
    expect(inbox).toHaveLength(1);
    expect((await mail.inbox()).length).toBe(1);
    const [message] = inbox as unknown as Array<{ id: number; subject: string; text: string; attachments: Array<{ filename: string; contentType: string; size: number }> }>;
    expect(message!.subject).toBe('World Shop: the timing record of your engine');
    expect(message!.text).toContain('local regulations come first');
    expect(message!.attachments).toEqual([{ filename: `timing-record-${build.id}.pdf`, contentType: 'application/pdf', size: expect.any(Number) }]);
    const bytes = Buffer.from(await (await fetch(`http://127.0.0.1:${mail.httpPort}/messages/${message!.id}/attachments/0`)).arrayBuffer());
    expect(bytes.length).toBe(message!.attachments[0]!.size);
    expect(bytes.subarray(0, 5).toString('latin1')).toBe('%PDF-'); // ISO 32000-1 §7.5.2: a PDF file starts with %PDF-
    const { text } = await readPdfText(new Uint8Array(bytes));
    expect(text).toContain(BUILD_SAMPLE.customerName);

    const audit = await auditOf(world.shop.id, 10, world.knex);
    expect(audit.find((a) => a.action === 'build-sent')?.detail).toBe(JSON.stringify({ buildId: build.id, to: BUILD_SAMPLE.customerEmail }));
    actAs(world.users.viewer.id);
    expect((await (await buildApi.get(ws, build.id)).json()).build.sends).toHaveLength(1);
  });

  it('refuses a viewer, a record without a customer e-mail, and a workspace over its hourly limit, mailing nothing', async () => {
    const build = await created();
    actAs(world.users.viewer.id);
    expect((await buildApi.send(ws, build.id)).status).toBe(403);
    const noAddress = await created({ ...BUILD_SAMPLE, customerEmail: '' });
    const refused = await buildApi.send(ws, noAddress.id);
    expect(refused.status).toBe(400);
    expect((await refused.json()).issues[0]).toMatchObject({ path: 'customerEmail', message: expect.stringMatching(/^Customer e-mail is needed/) });
    for (let i = 0; i < 30; i += 1) await consumePoint([['buildSendPerWorkspace', String(world.shop.id)]]);
    const limited = await buildApi.send(ws, build.id);
    expect(limited.status).toBe(429);
    expect(await mail.inbox()).toEqual([]);
  });
});
