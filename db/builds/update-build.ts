import 'server-only';
import { db } from '@/db/knex';
import { TABLES } from '@/db/tables';
import type { BuildFields } from '@/lib/builds/build-fields';
import { buildResults } from '@/lib/builds/build-results';
import { buildCrossFieldIssues, mergeBuildPatch } from '@/lib/builds/build-schema';
import { statusChangeProblem, statusDates } from '@/lib/builds/build-status';
import { diffBuildFields } from '@/lib/builds/revision-diff';
import { fieldsToColumns } from './build-row';
import { findBuild, findStoredBuild } from './find-build';
import { referenceIssues, workspaceToleranceDeg } from './references';
import type { SaveOutcome } from './save-outcome';

export const HANDED_OVER_MESSAGE = 'This record was handed over to the customer: only an owner can change or reopen it';

/**
 * Applies `changes` if the record is still at `baseVersion` (optimistic concurrency, as
 * templates do): the UPDATE carries `WHERE version = ?`, so of two saves from one version
 * exactly one is written and the other learns who saved and when. A handed-over record
 * changes only for a caller allowed to reopen it. A save that changes nothing keeps the version.
 */
export async function updateBuild(
  workspaceId: number,
  id: number,
  user: { id: number; mayChangeHandedOver: boolean },
  baseVersion: number,
  changes: Partial<BuildFields>,
): Promise<SaveOutcome> {
  return db().transaction(async (trx): Promise<SaveOutcome> => {
    const stored = await findStoredBuild(workspaceId, id, trx);
    if (!stored) return { ok: false, reason: 'not-found' };
    if (stored.build.version !== baseVersion) return { ok: false, reason: 'conflict', current: stored.build };

    const before = stored.fields;
    const after = mergeBuildPatch(before, changes);
    const diff = diffBuildFields(before, after);
    if (diff.length === 0) return { ok: true, build: stored.build, changed: false };
    if (before.status === 'handed-over' && !user.mayChangeHandedOver) return { ok: false, reason: 'forbidden', message: HANDED_OVER_MESSAGE };
    const statusProblem = statusChangeProblem(before.status, after.status);
    const issues = [
      ...(statusProblem ? [{ path: 'status', message: statusProblem }] : []),
      ...buildCrossFieldIssues(after),
      ...(await referenceIssues(trx, workspaceId, after)),
    ];
    if (issues.length > 0) return { ok: false, reason: 'invalid', issues };

    const at = new Date().toISOString();
    const dates = statusDates(after.status, at.slice(0, 10), stored);
    const results = buildResults(after, await workspaceToleranceDeg(trx, workspaceId));
    const updated = await trx(TABLES.builds)
      .where({ id, workspace_id: workspaceId, version: baseVersion })
      .update({
        ...fieldsToColumns(after),
        finished_on: dates.finishedOn,
        handed_over_on: dates.handedOverOn,
        results_json: JSON.stringify(results),
        version: baseVersion + 1,
        updated_by: user.id,
        updated_at: at,
      });
    if (updated !== 1) return { ok: false, reason: 'conflict', current: (await findBuild(workspaceId, id, trx))! };
    await trx(TABLES.buildRevisions).insert({
      build_id: id,
      version: baseVersion + 1,
      action: 'update',
      user_id: user.id,
      created_at: at,
      changes_json: JSON.stringify(diff),
      snapshot_json: JSON.stringify(after),
    });
    return { ok: true, build: (await findBuild(workspaceId, id, trx))!, changed: true };
  });
}
