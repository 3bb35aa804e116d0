import type { Metadata } from 'next';
import Link from 'next/link';
import { notFound } from 'next/navigation';
import { pageAction } from '@/app/lib/page-access';
import { BuildPrintLinks } from '@/components/builds/build-print-links';
import { BlowdownResult, PortResult, TdcResult, TimingResult, ToleranceNote } from '@/components/builds/result-texts';
import { StatusBadge } from '@/components/builds/status-badge';
import { ActionButton } from '@/components/templates/template-actions';
import { findStoredBuild } from '@/db/builds/find-build';
import { listBuildRevisions } from '@/db/builds/revisions';
import { listBuildPhotos } from '@/db/builds/photos';
import { PhotoGallery } from '@/components/photos/photo-gallery';
import { EditLink, RecordHeader } from '@/components/records/record-header';
import { RecordSection } from '@/components/records/record-section';
import { defaultProfileOf } from '@/db/printer-profiles';
import { findTemplate } from '@/db/templates/find-template';
import { can } from '@/lib/access-policy';
import { buildFields, type BuildStatus } from '@/lib/builds/build-fields';
import { statusChangeProblem } from '@/lib/builds/build-status';
import { degText, mmText } from '@/lib/builds/customer-copy';
import { parsePathId } from '@/lib/path-id';
import { requestDateFormat } from '@/app/lib/date-format';
import { formatDate, formatDateTime } from '@/lib/format/date-format';

export const dynamic = 'force-dynamic';
export const metadata: Metadata = { title: 'Build record' };

type Props = { params: Promise<{ workspace: string; id: string }> };

const STATUS_ACTIONS: Array<{ to: BuildStatus; label: string }> = [
  { to: 'done', label: 'Mark done' },
  { to: 'handed-over', label: 'Mark handed over' },
  { to: 'open', label: 'Reopen' },
];

const F = buildFields;

export default async function BuildPage({ params }: Props) {
  const { workspace: slug, id } = await params;
  const access = await pageAction(`/w/${slug}/builds/${id}`);
  const buildId = parsePathId(id);
  const stored = buildId ? await findStoredBuild(access.workspace.id, buildId) : null;
  if (!stored) notFound();
  const { build } = stored;
  const [revisions, template, profile, photos, dateFormat] = await Promise.all([
    listBuildRevisions(build.id),
    build.templateId ? findTemplate(access.workspace.id, build.templateId) : Promise.resolve(null),
    defaultProfileOf(access.workspace.id),
    listBuildPhotos(build.id),
    requestDateFormat(),
  ]);
  const api = `/api/v1/workspaces/${slug}/builds/${build.id}`;
  const finalForMe = build.status === 'handed-over' && !can(access.role, 'build.reopen-handed-over');
  const canEdit = can(access.role, 'build.edit') && !finalForMe;
  const canSend = can(access.role, 'build.send');

  return (
    <article className="space-y-8">
      <RecordHeader
        back={{ href: `/w/${slug}/builds`, label: 'Build records' }}
        title={
          <>
            {build.customerName} <StatusBadge status={build.status} />
          </>
        }
        actions={
          <>
            {canEdit ? <EditLink href={`/w/${slug}/builds/${build.id}/edit`} /> : null}
            {canEdit
              ? STATUS_ACTIONS.filter((a) => a.to !== build.status && !statusChangeProblem(build.status, a.to)).map((a) => (
                  <ActionButton key={a.to} url={api} method="PATCH" body={{ version: build.version, status: a.to }} label={a.label} busyLabel="Saving…" />
                ))
              : null}
            {can(access.role, 'build.delete') ? (
              <ActionButton url={api} method="DELETE" label="Delete" busyLabel="Deleting…" confirm={{
                  title: `Delete the record of ${build.customerName}?`,
                  message: `The build record of ${build.customerName} is deleted with its history and sends. This cannot be undone.`,
                  confirmLabel: 'Delete record',
                  danger: true,
                }} after={`/w/${slug}/builds`} />
            ) : null}
          </>
        }
      >
        <p className="text-steel-600 dark:text-steel-300">
          {[build.engineDescription, build.engineNumber && `engine ${build.engineNumber}`, build.frameNumber && `frame ${build.frameNumber}`].filter(Boolean).join(' · ')}
        </p>
        <p className="text-xs text-steel-500">
          Opened {formatDate(build.openedOn, dateFormat)}
          {build.finishedOn ? ` · finished ${formatDate(build.finishedOn, dateFormat)}` : ''}
          {build.handedOverOn ? ` · handed over ${formatDate(build.handedOverOn, dateFormat)}` : ''} · technician {build.technician?.name ?? '—'} · version {build.version}, last changed by{' '}
          {build.updatedBy?.name ?? 'a removed user'} at {formatDateTime(build.updatedAt, dateFormat)}
        </p>
        {build.template ? (
          <p className="text-xs text-steel-500">
            From template{' '}
            <Link href={`/w/${slug}/templates/${build.template.id}`} className="underline">
              {build.template.name}
            </Link>{' '}
            version {build.template.version}
          </p>
        ) : null}
        {finalForMe ? <p className="mt-1 text-sm">Handed over to the customer: only an owner can change or reopen this record.</p> : null}
      </RecordHeader>

      <RecordSection id="copy" title="Customer’s copy">
        <div className="flex flex-wrap items-start gap-3 text-sm">
          <a href={`${api}/record?format=pdf`} className="rounded-md border border-steel-300 px-3 py-1.5">
            Download PDF (A4)
          </a>
          <a href={`${api}/record?format=pdf&paper=Letter`} className="rounded-md border border-steel-300 px-3 py-1.5">
            Download PDF (Letter)
          </a>
          {canSend ? (
            build.customerEmail ? (
              <ActionButton url={`${api}/send`} label={`Send to ${build.customerEmail}`} busyLabel="Sending…" confirm={{
                title: `Mail the customer’s copy to ${build.customerEmail}?`,
                message: `A PDF of this record goes to ${build.customerEmail} now, and the send is recorded on the record.`,
                confirmLabel: 'Send',
              }} />
            ) : (
              <span className="text-steel-600">Add the customer’s e-mail to send the copy.</span>
            )
          ) : null}
        </div>
        {build.sends.length > 0 ? (
          <ul aria-label="Sent copies" className="text-sm">
            {build.sends.map((send) => (
              <li key={send.id}>
                Sent to {send.to} at {formatDateTime(send.sentAt, dateFormat)} by {send.sentBy?.name ?? 'a removed user'}
              </li>
            ))}
          </ul>
        ) : (
          <p className="text-sm text-steel-600">Not sent yet.</p>
        )}
      </RecordSection>

      <RecordSection id="tdc" title="Top dead centre" className="space-y-1">
        {build.stops ? (
          <p className="text-sm">
            {F.stops.label}: A <span className="font-mono">{degText(build.stops.readingADeg, dateFormat.locale)}</span>
            {build.stops.readingASide ? ` ${build.stops.readingASide}` : ''}, B <span className="font-mono">{degText(build.stops.readingBDeg, dateFormat.locale)}</span>
            {build.stops.readingBSide ? ` ${build.stops.readingBSide}` : ''} ({build.stops.numbering === 'full' ? '0–360° wheel' : '0–180° each side'})
          </p>
        ) : null}
        <TdcResult tdc={build.tdc} locale={dateFormat.locale} />
      </RecordSection>

      <RecordSection id="timing" title="Ignition timing" className="space-y-1">
        <TimingResult results={build} locale={dateFormat.locale} />
        <p className="text-sm text-steel-600 dark:text-steel-300">
          Entered in {build.timingEnteredAs === 'mm' ? 'mm' : 'degrees'}
          {build.advanceDeg !== null ? ` · specified ${degText(build.advanceDeg, dateFormat.locale, '° BTDC')}` : ''}
          {build.timingCheck ? ` · checked ${build.timingCheck}${build.timingCheck === 'strobe' && build.timingCheckRpm ? ` at ${build.timingCheckRpm} rpm` : ''}` : ' · not checked yet'}
        </p>
      </RecordSection>

      <RecordSection id="ports" title="Port timing">
        <p className="text-sm">
          Stroke {mmText(build.strokeMm, dateFormat.locale)} · rod {mmText(build.rodMm, dateFormat.locale)} · pin offset {mmText(build.pinOffsetMm, dateFormat.locale)} · deck {mmText(build.deckMm, dateFormat.locale)}
        </p>
        {build.ports.length === 0 ? (
          <p className="text-sm text-steel-600">No ports measured.</p>
        ) : (
          <table className="text-sm">
            <thead>
              <tr className="text-left">
                <th scope="col" className="pr-6">Port</th>
                <th scope="col" className="pr-6">Edge depth</th>
                <th scope="col">Result</th>
              </tr>
            </thead>
            <tbody>
              {build.ports.map((port, i) => (
                <tr key={i}>
                  <td className="pr-6">{port.name}</td>
                  <td className="pr-6 font-mono">{mmText(port.heightMm, dateFormat.locale)}</td>
                  <td>
                    <PortResult port={port} toleranceDeg={build.toleranceDeg} locale={dateFormat.locale} />
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        )}
        <BlowdownResult results={build} locale={dateFormat.locale} />
        <ToleranceNote toleranceDeg={build.toleranceDeg} locale={dateFormat.locale} />
      </RecordSection>

      <RecordSection id="other" title="Other measurements and notes" className="space-y-1">
        <ul className="text-sm">
          {build.squishMm !== null ? (
            <li>
              {F.squishMm.label}: <span className="font-mono">{mmText(build.squishMm, dateFormat.locale)}</span>
            </li>
          ) : null}
          {build.otherMeasurements.map((m, i) => (
            <li key={i}>
              {m.name}: <span className="font-mono">{[m.value, m.unit].filter(Boolean).join(' ')}</span>
            </li>
          ))}
        </ul>
        {build.notes ? <p className="whitespace-pre-line text-sm">{build.notes}</p> : null}
      </RecordSection>

      <RecordSection id="photos" title="Photos" className="space-y-3">
        <PhotoGallery photosUrl={`${api}/photos`} photos={photos} canEdit={canEdit} altOf={`of the engine of ${build.customerName}`} removedFrom={`the record of ${build.customerName}`} />
      </RecordSection>

      <RecordSection id="print" title="Print the sheets for this build">
        <BuildPrintLinks template={template} build={build} sheetUrl={`${api}/sheet`} profileName={profile?.name ?? null} workspaceSlug={slug} />
      </RecordSection>

      <RecordSection id="history" title="History">
        <ol className="space-y-1 text-sm">
          {revisions.map((r) => (
            <li key={r.id}>
              Version {r.version} · {r.action} by {r.user?.name ?? 'a removed user'} at {formatDateTime(r.createdAt, dateFormat)}:{' '}
              <span className="text-steel-600 dark:text-steel-300">{r.changes.map((c) => buildFields[c.field as keyof typeof buildFields]?.label ?? c.field).join(', ') || 'no field changes'}</span>
            </li>
          ))}
        </ol>
      </RecordSection>
    </article>
  );
}
