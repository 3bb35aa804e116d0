import type { TemplateRevision } from '@/lib/templates/template';
import type { TemplateFieldName } from '@/lib/templates/template-schema';
import { ActionButton } from './template-actions';
import { formatDateTime, type DateFormat } from '@/lib/format/date-format';
import { FIELD_LABELS, formatFieldValue } from './field-labels';

const ACTIONS: Record<TemplateRevision['action'], string> = {
  create: 'created',
  update: 'changed',
  restore: 'restored',
  import: 'imported',
};

type Props = { revisions: TemplateRevision[]; currentVersion: number; restoreUrl: (version: number) => string; canEdit: boolean; dateFormat: DateFormat };

/** Every saved change, newest first: who, when, which fields old → new; editors may restore an earlier one. */
export function TemplateHistory({ revisions, currentVersion, restoreUrl, canEdit, dateFormat }: Props) {
  return (
    <ol aria-label="History" className="space-y-3">
      {revisions.map((r) => (
        <li key={r.id} className="rounded-md border border-steel-200 p-3 text-sm dark:border-steel-700">
          <div className="flex flex-wrap items-baseline justify-between gap-2">
            <p>
              <span className="font-semibold">Version {r.version}</span> — {ACTIONS[r.action]}
              {r.restoredFromVersion ? ` from version ${r.restoredFromVersion}` : ''} by {r.user?.name ?? 'a removed user'} at{' '}
              <time dateTime={r.createdAt}>{formatDateTime(r.createdAt, dateFormat)}</time>
            </p>
            {canEdit && r.version !== currentVersion ? (
              <ActionButton
                url={restoreUrl(r.version)}
                body={{ version: currentVersion }}
                label={`Restore version ${r.version}`}
                busyLabel="Restoring…"
                confirm={{
                  title: `Restore version ${r.version}?`,
                  message: `The template’s figures go back to how they were at version ${r.version}. This is saved as a new version ${currentVersion + 1}; the versions in between stay in the history.`,
                  confirmLabel: `Restore version ${r.version}`,
                }}
              />
            ) : null}
          </div>
          {r.changes.length ? (
            <ul className="mt-2 space-y-0.5 text-xs">
              {r.changes.map((c) => (
                <li key={c.field}>
                  <span className="font-medium">{FIELD_LABELS[c.field as TemplateFieldName] ?? c.field}</span>:{' '}
                  <del className="text-steel-500">{formatFieldValue(c.field, c.from, dateFormat.locale)}</del> → <ins className="no-underline">{formatFieldValue(c.field, c.to, dateFormat.locale)}</ins>
                </li>
              ))}
            </ul>
          ) : null}
        </li>
      ))}
    </ol>
  );
}
