import type { FieldChange, RevisionAction } from './templates/template';

/**
 * A workspace's activity from its two records: the audit log (members, roles, invitations, deletions, imports,
 * photos, and whatever else is logged against the workspace) and the template revisions (every create, edit,
 * restore and import with its field changes). Newest first; the words are the page's business.
 */
export type ActivityRecord =
  | {
      source: 'audit';
      id: number;
      at: string;
      actorName: string | null;
      action: string;
      detail: Record<string, unknown>;
      /** The member the entry is about (detail.userId), by name. */
      subjectName: string | null;
    }
  | {
      source: 'revision';
      id: number;
      at: string;
      actorName: string | null;
      action: RevisionAction;
      templateId: number;
      templateName: string;
      version: number;
      restoredFromVersion: number | null;
      changes: FieldChange[];
    }
  | {
      source: 'build-revision';
      id: number;
      at: string;
      actorName: string | null;
      action: 'create' | 'update';
      buildId: number;
      /** The customer and engine the record is about: "Jo Harker, 125 scooter". */
      buildName: string;
      changes: FieldChange[];
    };
