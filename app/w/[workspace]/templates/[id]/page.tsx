import { parsePathId } from '@/lib/path-id';
import type { Metadata } from 'next';
import { notFound } from 'next/navigation';
import { requestDateFormat } from '@/app/lib/date-format';
import { pageAction } from '@/app/lib/page-access';
import { formatDateTime } from '@/lib/format/date-format';
import { can } from '@/lib/access-policy';
import { FIELD_LABELS, FIGURE_FIELDS, formatFieldValue } from '@/components/templates/field-labels';
import { PhotoGallery } from '@/components/photos/photo-gallery';
import { EditLink, RecordHeader } from '@/components/records/record-header';
import { RecordSection } from '@/components/records/record-section';
import { PrintLinks } from '@/components/templates/print-links';
import { ActionButton } from '@/components/templates/template-actions';
import { TemplateHistory } from '@/components/templates/template-history';
import { findTemplate } from '@/db/templates/find-template';
import { listPhotos } from '@/db/templates/photos';
import { listRevisions } from '@/db/templates/revisions';
import { TemplateBuilds } from '@/components/builds/template-builds';
import { defaultProfileOf } from '@/db/printer-profiles';
import { listBuilds } from '@/db/builds/list-builds';

export const dynamic = 'force-dynamic';
export const metadata: Metadata = { title: 'Engine template' };

type Props = { params: Promise<{ workspace: string; id: string }> };

export default async function TemplatePage({ params }: Props) {
  const { workspace: slug, id } = await params;
  const access = await pageAction(`/w/${slug}/templates/${id}`);
  const templateId = parsePathId(id);
  const template = templateId ? await findTemplate(access.workspace.id, templateId) : null;
  if (!template) notFound();
  const [photos, revisions, builds, profile, dateFormat] = await Promise.all([
    listPhotos(template.id),
    listRevisions(template.id),
    can(access.role, 'build.read')
      ? listBuilds(access.workspace.id, { q: '', status: 'all', template: template.id, sort: 'updatedAt', dir: 'desc', page: 1, pageSize: 20 })
      : Promise.resolve(null),
    defaultProfileOf(access.workspace.id),
    requestDateFormat(),
  ]);
  const canEdit = can(access.role, 'template.edit');
  const api = `/api/v1/workspaces/${slug}/templates/${template.id}`;

  return (
    <article className="space-y-8">
      <RecordHeader
        back={{ href: `/w/${slug}/templates`, label: 'Engine templates' }}
        title={
          <>
            {template.name} {template.archived ? <span className="ml-2 rounded bg-steel-200 px-2 py-0.5 text-sm font-medium text-steel-700">archived</span> : null}
          </>
        }
        actions={
          canEdit ? (
            <>
              <EditLink href={`/w/${slug}/templates/${template.id}/edit`} />
              <ActionButton
                url={`${api}/archive`}
                body={{ version: template.version, archived: !template.archived }}
                label={template.archived ? 'Un-archive' : 'Archive'}
                busyLabel="Saving…"
              />
              {can(access.role, 'template.delete') ? (
                <ActionButton
                  url={api}
                  method="DELETE"
                  label="Delete"
                  busyLabel="Deleting…"
                  confirm={{
                    title: `Delete ${template.name}?`,
                    message: `${template.name} is deleted with its photos and its history. This cannot be undone; Archive keeps it out of the list instead.`,
                    confirmLabel: 'Delete template',
                    danger: true,
                  }}
                  after={`/w/${slug}/templates`}
                />
              ) : null}
            </>
          ) : null
        }
      >
        <p className="text-steel-600 dark:text-steel-300">{template.description}</p>
        <p className="text-xs text-steel-500">
          Version {template.version} · last changed by {template.updatedBy?.name ?? 'a removed user'} at {formatDateTime(template.updatedAt, dateFormat)}
        </p>
      </RecordHeader>

      <RecordSection id="print" title="Print from this template">
        <PrintLinks template={template} sheetUrl={`${api}/sheet`} workspaceSlug={slug} />
        <p className="text-xs text-steel-500">
          {profile ? `PDF and SVG are corrected for “${profile.name}”, the workspace’s default printer profile; the title block names it.` : 'The workspace has no default printer profile: sheets are not corrected.'}
        </p>
        <p className="text-xs text-steel-500">
          Take the plug lead off before turning the engine; turn a positive stop only by hand and remove it before starting. The engine maker’s manual comes first.
        </p>
      </RecordSection>

      {builds ? <TemplateBuilds slug={slug} templateId={template.id} page={builds} canCreate={can(access.role, 'build.edit')} dateFormat={dateFormat} /> : null}

      <RecordSection id="figures" title="Figures">
        <dl className="grid gap-x-6 gap-y-1 text-sm sm:grid-cols-[12rem_1fr]">
          {FIGURE_FIELDS.map((field) => (
            <div key={field} className="contents">
              <dt className="text-steel-600 dark:text-steel-300">{FIELD_LABELS[field]}</dt>
              <dd className="font-mono tabular-nums">{formatFieldValue(field, template[field], dateFormat.locale)}</dd>
            </div>
          ))}
        </dl>
        {template.portTargets.length ? (
          <table className="mt-2 text-sm">
            <caption className="text-left font-medium">Port targets (crank degrees from TDC)</caption>
            <thead>
              <tr className="text-left">
                <th scope="col" className="pr-6">Port</th>
                <th scope="col" className="pr-6">Opens</th>
                <th scope="col" className="pr-6">Closes</th>
                <th scope="col">Duration</th>
              </tr>
            </thead>
            <tbody className="font-mono">
              {template.portTargets.map((p) => (
                <tr key={p.name}>
                  <td className="pr-6 font-sans">{p.name}</td>
                  <td className="pr-6">{p.opensCrankDeg}°</td>
                  <td className="pr-6">{p.closesCrankDeg}°</td>
                  <td>{(((p.closesCrankDeg - p.opensCrankDeg) % 360) + 360) % 360}°</td>
                </tr>
              ))}
            </tbody>
          </table>
        ) : null}
        {template.notes ? <p className="whitespace-pre-line text-sm">{template.notes}</p> : null}
      </RecordSection>

      <RecordSection id="photos" title="Photos" className="space-y-3">
        <PhotoGallery photosUrl={`${api}/photos`} photos={photos} canEdit={canEdit} altOf={`of ${template.name}`} removedFrom={template.name} />
      </RecordSection>

      <RecordSection id="history" title="History">
        <TemplateHistory revisions={revisions} currentVersion={template.version} restoreUrl={(v) => `${api}/revisions/${v}/restore`} canEdit={canEdit} dateFormat={dateFormat} />
      </RecordSection>
    </article>
  );
}
