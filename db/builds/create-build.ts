import 'server-only';
import { db } from '@/db/knex';
import { TABLES } from '@/db/tables';
import type { BuildFields } from '@/lib/builds/build-fields';
import { buildResults } from '@/lib/builds/build-results';
import { statusDates } from '@/lib/builds/build-status';
import { creationChanges } from '@/lib/builds/revision-diff';
import { fieldsToColumns } from './build-row';
import { findBuild } from './find-build';
import { referenceIssues, workspaceToleranceDeg } from './references';
import type { SaveOutcome } from './save-outcome';

/**
 * Stores a new record (version 1) with its computed results and first revision. The
 * technician defaults to the creator, the template version to the template's current one.
 */
export async function createBuild(workspaceId: number, userId: number, input: BuildFields): Promise<SaveOutcome> {
  return db().transaction(async (trx): Promise<SaveOutcome> => {
    const fields: BuildFields = { ...input, technicianId: input.technicianId ?? userId };
    const issues = await referenceIssues(trx, workspaceId, fields);
    if (issues.length > 0) return { ok: false, reason: 'invalid', issues };
    if (fields.templateId !== null && fields.templateVersion === null) {
      const template: { version: number } = await trx(TABLES.templates).where('id', fields.templateId).first('version');
      fields.templateVersion = template.version;
    }
    const at = new Date().toISOString();
    const dates = statusDates(fields.status, at.slice(0, 10), { finishedOn: null, handedOverOn: null });
    const results = buildResults(fields, await workspaceToleranceDeg(trx, workspaceId));
    const [row]: Array<{ id: number }> = await trx(TABLES.builds)
      .insert({
        ...fieldsToColumns(fields),
        workspace_id: workspaceId,
        finished_on: dates.finishedOn,
        handed_over_on: dates.handedOverOn,
        results_json: JSON.stringify(results),
        version: 1,
        created_by: userId,
        updated_by: userId,
        created_at: at,
        updated_at: at,
      })
      .returning('id');
    await trx(TABLES.buildRevisions).insert({
      build_id: row!.id,
      version: 1,
      action: 'create',
      user_id: userId,
      created_at: at,
      changes_json: JSON.stringify(creationChanges(fields)),
      snapshot_json: JSON.stringify(fields),
    });
    return { ok: true, build: (await findBuild(workspaceId, row!.id, trx))!, changed: true };
  });
}
