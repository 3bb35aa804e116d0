import type { TemplateFields } from './template-schema';

export type UserRef = { id: number; name: string } | null;

/** A stored template as the API returns it. Times are ISO 8601 strings (UTC). */
export type Template = TemplateFields & {
  id: number;
  version: number;
  createdAt: string;
  updatedAt: string;
  createdBy: UserRef;
  updatedBy: UserRef;
};

export type TemplatePhoto = {
  id: number;
  templateId: number;
  contentType: 'image/jpeg' | 'image/png' | 'image/webp';
  widthPx: number;
  heightPx: number;
  bytes: number;
  caption: string;
  createdAt: string;
};

export type FieldChange = { field: string; from: unknown; to: unknown };

export type RevisionAction = 'create' | 'update' | 'restore' | 'import';

export type TemplateRevision = {
  id: number;
  templateId: number;
  version: number;
  action: RevisionAction;
  restoredFromVersion: number | null;
  user: UserRef;
  createdAt: string;
  changes: FieldChange[];
};

export type TemplatePage = { items: Template[]; total: number; page: number; pageSize: number };
