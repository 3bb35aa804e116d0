import type { FieldChange, TemplatePhoto, UserRef } from '@/lib/templates/template';
import type { BuildFields } from './build-fields';
import type { BuildPortResult, BuildResults } from './build-results';

/** A photo of the engine as set up: stored like a template photo (content-checked, re-encoded, no metadata). */
export type BuildPhoto = Omit<TemplatePhoto, 'templateId'> & { buildId: number };

/** A send of the customer's copy: when, to whom, by whom. */
export type BuildSend = { id: number; to: string; sentAt: string; sentBy: UserRef };

/**
 * A stored build record as the API returns it: its fields, with the computed results
 * under the calculators' names (`tdc`, `ports` with their angles and deviations,
 * `blowdownDeg`, both timing figures). Times are ISO 8601 strings (UTC).
 */
export type Build = Omit<BuildFields, 'ports' | 'timingSetDegBTDC' | 'timingSetMmBTDC'> &
  Omit<BuildResults, 'ports'> & {
    id: number;
    ports: BuildPortResult[];
    technician: UserRef;
    template: { id: number; name: string; version: number | null } | null;
    finishedOn: string | null;
    handedOverOn: string | null;
    sends: BuildSend[];
    version: number;
    createdAt: string;
    updatedAt: string;
    createdBy: UserRef;
    updatedBy: UserRef;
  };

export type BuildRevision = {
  id: number;
  buildId: number;
  version: number;
  action: 'create' | 'update';
  user: UserRef;
  createdAt: string;
  changes: FieldChange[];
};

export type BuildPage = { items: Build[]; total: number; page: number; pageSize: number };
