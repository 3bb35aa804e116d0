import type { Knex } from 'knex';
import { TABLES } from '@/db/tables';
import { buildFields, type BuildFields } from '@/lib/builds/build-fields';
import type { BuildIssue } from '@/lib/builds/build-schema';

/** The record's links that only the database can check: its template and technician belong to its workspace. */
export async function referenceIssues(knex: Knex | Knex.Transaction, workspaceId: number, b: BuildFields): Promise<BuildIssue[]> {
  const issues: BuildIssue[] = [];
  if (b.templateId !== null) {
    const template: { version: number } | undefined = await knex(TABLES.templates).where({ id: b.templateId, workspace_id: workspaceId }).first('version');
    if (!template) issues.push({ path: 'templateId', message: `${buildFields.templateId.label}: this workspace has no template number ${b.templateId}` });
    else if (b.templateVersion !== null && b.templateVersion > template.version)
      issues.push({ path: 'templateVersion', message: `${buildFields.templateVersion.label} must be at most ${template.version}, the template's current version (allowed 1–${template.version})` });
  }
  if (b.technicianId !== null) {
    const member = await knex(TABLES.memberships).where({ user_id: b.technicianId, workspace_id: workspaceId }).first('id');
    if (!member) issues.push({ path: 'technicianId', message: `${buildFields.technicianId.label} must be a member of this workspace` });
  }
  return issues;
}

/** The workspace's ± port duration tolerance in degrees. */
export async function workspaceToleranceDeg(knex: Knex | Knex.Transaction, workspaceId: number): Promise<number> {
  const row: { build_tolerance_deg: number } | undefined = await knex(TABLES.workspaces).where('id', workspaceId).first('build_tolerance_deg');
  return row?.build_tolerance_deg ?? 2;
}

export async function setWorkspaceToleranceDeg(knex: Knex | Knex.Transaction, workspaceId: number, toleranceDeg: number): Promise<void> {
  await knex(TABLES.workspaces).where('id', workspaceId).update({ build_tolerance_deg: toleranceDeg });
}
