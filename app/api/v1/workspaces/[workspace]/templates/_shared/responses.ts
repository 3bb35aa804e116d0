import 'server-only';
import type { Template } from '@/lib/templates/template';
import type { UpdateOutcome } from '@/db/templates/update-template';
import { jsonError } from '@/app/lib/api';
import { templateNotFound } from './template-params';
import { formatDateTime, type DateFormat } from '@/lib/format/date-format';

/**
 * "changed by X at T — reload": a stale save never overwrites; the caller gets the current state back.
 * T is written for the reader (`dateFormat`, DEVELOPERS.md "Dates"); `current.updatedAt` stays ISO 8601.
 */
export function conflictResponse(current: Template, dateFormat: DateFormat): Response {
  const who = current.updatedBy?.name || 'someone';
  const error = `This template was changed by ${who} at ${formatDateTime(current.updatedAt, dateFormat)} (now version ${current.version}) — reload to see the changes, then apply yours again`;
  return Response.json(
    { error, issues: [{ path: 'version', message: error }], current },
    { status: 409 },
  );
}

export function updateResponse(outcome: UpdateOutcome, dateFormat: DateFormat): Response {
  if (outcome.ok) return Response.json({ template: outcome.template, changed: outcome.changed });
  if (outcome.reason === 'not-found') return templateNotFound();
  if (outcome.reason === 'conflict') return conflictResponse(outcome.current, dateFormat);
  return jsonError(400, 'Some fields are not valid', outcome.issues);
}
