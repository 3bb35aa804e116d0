import type { ActivityRecord } from '@/lib/activity-record';
import { FIELD_LABELS, formatFieldValue } from '@/components/templates/field-labels';
import type { FieldChange } from '@/lib/templates/template';
import type { TemplateFieldName } from '@/lib/templates/template-schema';
import { buildFields } from '@/lib/builds/build-fields';
import { countOf, formatDecimal } from '@/lib/format/number-format';

/** The activity filter's groups. */
export const ACTIVITY_GROUPS = ['all', 'members', 'templates', 'photos', 'builds'] as const;
export type ActivityGroup = (typeof ACTIVITY_GROUPS)[number];

export type ActivityLine = { key: string; at: string; group: Exclude<ActivityGroup, 'all'>; text: string; href?: string };

const SHOWN_CHANGES = 3;

const article = (role: unknown) => (role === 'owner' ? 'an' : 'a');
const text = (value: unknown, fallback: string) => (typeof value === 'string' && value !== '' ? value : fallback);

function groupOf(action: string): ActivityLine['group'] {
  if (action.startsWith('photo-')) return 'photos';
  if (action.startsWith('template')) return 'templates';
  if (action.includes('build')) return 'builds';
  return 'members';
}

/** "static advance 17° BTDC → 18° BTDC, rim diameter — → 128 mm and 2 more" */
function changeWords(changes: FieldChange[], locale: string): string {
  const shown = changes.slice(0, SHOWN_CHANGES).map((c) => {
    const label = (FIELD_LABELS[c.field as TemplateFieldName] ?? c.field).toLowerCase();
    return `${label} ${formatFieldValue(c.field, c.from, locale)} → ${formatFieldValue(c.field, c.to, locale)}`;
  });
  const more = changes.length - shown.length;
  return `${shown.join(', ')}${more > 0 ? ` and ${countOf(more, 'more change', locale)}` : ''}`;
}

function revisionWords(record: ActivityRecord & { source: 'revision' }, who: string, locale: string): string {
  const name = record.templateName;
  if (record.action === 'create') return `${who} created ${name}`;
  if (record.action === 'import') return `${who} imported ${name} from a CSV file`;
  if (record.action === 'restore') return `${who} restored ${name} to version ${record.restoredFromVersion ?? '?'}`;
  const archived = record.changes.find((c) => c.field === 'archived');
  if (archived && record.changes.length === 1) return `${who} ${archived.to ? 'archived' : 'un-archived'} ${name}`;
  return record.changes.length ? `${who} edited ${name}: ${changeWords(record.changes, locale)}` : `${who} saved ${name} unchanged`;
}

function auditWords(record: ActivityRecord & { source: 'audit' }, who: string, locale: string): string {
  const d = record.detail;
  const subject = record.subjectName ?? 'a former member';
  switch (record.action) {
    case 'role-changed':
      return `${who} made ${subject} ${article(d.to)} ${text(d.to, 'member')}${typeof d.from === 'string' ? ` (was ${d.from})` : ''}`;
    case 'member-removed':
      return `${who} removed ${subject} from the workspace`;
    case 'member-left':
      return `${who} left the workspace`;
    case 'invitation-sent':
      return `${who} invited ${text(d.email, 'someone')} as ${article(d.role)} ${text(d.role, 'member')}`;
    case 'invitation-accepted':
      return `${who} joined as ${article(d.role)} ${text(d.role, 'member')}`;
    case 'workspace-created':
      return `${who} created the workspace ${text(d.name, '')}`.trim();
    case 'template-deleted':
      return `${who} deleted the template ${text(d.name, '')}`.trim();
    case 'templates-imported': {
      const updated = typeof d.updated === 'number' && d.updated > 0 ? ` and updated ${countOf(d.updated, 'template', locale)}` : '';
      return `${who} imported ${countOf(typeof d.count === 'number' ? d.count : 0, 'new template', locale)}${updated} from a CSV file`;
    }
    case 'photo-added':
      return `${who} added a photo to ${text(d.name, 'a template')}`;
    case 'photo-deleted':
      return `${who} deleted a photo of ${text(d.name, 'a template')}`;
    case 'build-sent':
      return `${who} sent the customer’s copy of a build record to ${text(d.to, 'the customer')}`;
    default: {
      // Entries this page has no words for yet (new kinds of records) still read as words, never as JSON.
      const about = text(d.name, text(d.title, ''));
      return `${who}: ${record.action.replace(/-/g, ' ')}${about ? ` — ${about}` : ''}`;
    }
  }
}

function buildValue(value: unknown, locale: string): string {
  if (value === null || value === undefined || value === '' || (Array.isArray(value) && value.length === 0)) return '—';
  if (Array.isArray(value) || typeof value === 'object') return 'changed';
  return typeof value === 'number' ? formatDecimal(value, locale, { maxPlaces: 3 }) : String(value);
}

function buildChangeWords(changes: FieldChange[], locale: string): string {
  const labels = buildFields as unknown as Record<string, { label?: string } | undefined>;
  const shown = changes.slice(0, SHOWN_CHANGES).map((c) => {
    const label = (labels[c.field]?.label ?? c.field).toLowerCase();
    const from = buildValue(c.from, locale);
    const to = buildValue(c.to, locale);
    return to === 'changed' ? `${label} changed` : `${label} ${from} → ${to}`;
  });
  const more = changes.length - shown.length;
  return `${shown.join(', ')}${more > 0 ? ` and ${countOf(more, 'more change', locale)}` : ''}`;
}

/** One line of activity in words (figures in the reader's `locale`), with a link to the template it is about when that still exists. */
export function activityLine(record: ActivityRecord, workspaceSlug: string, locale: string): ActivityLine {
  const who = record.actorName ?? 'Someone';
  if (record.source === 'build-revision')
    return {
      key: `b${record.id}`,
      at: record.at,
      group: 'builds',
      text:
        record.action === 'create'
          ? `${who} opened the build record ${record.buildName}`
          : `${who} edited the build record ${record.buildName}: ${buildChangeWords(record.changes, locale) || 'nothing changed'}`,
      href: `/w/${workspaceSlug}/builds/${record.buildId}`,
    };
  if (record.source === 'revision')
    return {
      key: `r${record.id}`,
      at: record.at,
      group: 'templates',
      text: revisionWords(record, who, locale),
      href: `/w/${workspaceSlug}/templates/${record.templateId}`,
    };
  const templateId = record.detail.templateId;
  return {
    key: `a${record.id}`,
    at: record.at,
    group: groupOf(record.action),
    text: auditWords(record, who, locale),
    ...(record.action.startsWith('photo-') && typeof templateId === 'number' ? { href: `/w/${workspaceSlug}/templates/${templateId}` } : {}),
    ...(record.action === 'build-sent' && typeof record.detail.buildId === 'number' ? { href: `/w/${workspaceSlug}/builds/${record.detail.buildId}` } : {}),
  };
}
