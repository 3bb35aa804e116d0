import { z } from 'zod';
import { deadCentres, offsetCrankGeometryProblem } from '@/lib/engine/offset-slider-crank';
import { crankThrowMm } from '@/lib/engine/slider-crank';
import { shapeOf } from '@/lib/fields/field';
import { rangeText } from '@/lib/fields/range-text';
import { buildFields, TIMING_MM_RANGE, type BuildFieldKey, type BuildFields } from './build-fields';

/** The schemas of a build record, read from its field table, and the rules across fields. */

export type BuildIssue = { path: string; message: string };

/** A new record before the user or a template fills it in; `openedOn` is the day it is opened (UTC). */
export function emptyBuild(openedOn: string): BuildFields {
  return {
    customerName: '',
    customerEmail: '',
    customerPhone: '',
    engineNumber: '',
    frameNumber: '',
    engineDescription: '',
    templateId: null,
    templateVersion: null,
    technicianId: null,
    status: 'open',
    openedOn,
    strokeMm: null,
    rodMm: null,
    pinOffsetMm: 0,
    deckMm: null,
    rotation: 'cw',
    advanceDeg: null,
    stops: null,
    timingSetDegBTDC: null,
    timingSetMmBTDC: null,
    timingCheck: null,
    timingCheckRpm: null,
    ports: [],
    portTargets: [],
    squishMm: null,
    otherMeasurements: [],
    notes: '',
  };
}

const label = (key: BuildFieldKey) => buildFields[key].label;

function inRange(key: 'strokeMm' | 'rodMm' | 'pinOffsetMm', value: number | null): value is number {
  const { min, max } = buildFields[key];
  return typeof value === 'number' && value >= min! && value <= max!;
}

/** Rules across fields, checked on the whole record (after a patch is merged in): what the table's ranges cannot say. */
export function buildCrossFieldIssues(b: BuildFields): BuildIssue[] {
  const issues: BuildIssue[] = [];
  // A figure already out of its own range has its own message; the rules across fields wait for it.
  if (inRange('strokeMm', b.strokeMm) && inRange('rodMm', b.rodMm) && inRange('pinOffsetMm', b.pinOffsetMm)) {
    const problem = offsetCrankGeometryProblem({ strokeMm: b.strokeMm, rodMm: b.rodMm, pinOffsetMm: b.pinOffsetMm });
    if (problem?.field === 'rodMm' || problem?.field === 'strokeMm')
      issues.push({
        path: 'rodMm',
        message: `${label('rodMm')} must be longer than half the stroke (more than ${crankThrowMm(b.strokeMm)} mm, up to ${buildFields.rodMm.max} mm)`,
      });
    else if (problem)
      issues.push({
        path: 'pinOffsetMm',
        message: `${label('pinOffsetMm')} must be less than the con-rod length minus half the stroke (${Number((b.rodMm - crankThrowMm(b.strokeMm)).toFixed(3))} mm) either way, or the crank cannot pass BDC`,
      });
    else if (b.timingSetMmBTDC !== null) {
      const { trueStrokeMm } = deadCentres({ strokeMm: b.strokeMm, rodMm: b.rodMm, pinOffsetMm: b.pinOffsetMm });
      const maxMm = Math.min(TIMING_MM_RANGE.max, Number(trueStrokeMm.toFixed(3)));
      if (b.timingSetMmBTDC > trueStrokeMm)
        issues.push({
          path: 'timingSetMmBTDC',
          message: `${label('timingSetMmBTDC')} must be within the stroke (allowed ${rangeText(TIMING_MM_RANGE.min, maxMm, 'mm')})`,
        });
    }
  }
  if (b.timingSetDegBTDC !== null && b.timingSetMmBTDC !== null)
    issues.push({ path: 'timingSetMmBTDC', message: 'Give the timing set either in degrees or in mm before TDC, not both' });
  if (b.timingCheck === 'strobe' && b.timingCheckRpm === null)
    issues.push({
      path: 'timingCheckRpm',
      message: `${label('timingCheckRpm')} is needed when the timing is checked with a strobe (allowed ${rangeText(buildFields.timingCheckRpm.min!, buildFields.timingCheckRpm.max!, 'rpm')})`,
    });
  return issues;
}

function withCrossFieldRules<T extends z.ZodType<BuildFields>>(schema: T) {
  return schema.superRefine((b, ctx) => {
    for (const issue of buildCrossFieldIssues(b)) ctx.addIssue({ code: 'custom', path: [issue.path], message: issue.message });
  });
}

/** A whole record: the form, and the API's create once defaults and the template's figures are merged in. */
export const buildSchema = withCrossFieldRules(z.object(shapeOf(buildFields)).strict());

export const buildVersionSchema = z
  .number({ error: 'Version must be the version number you loaded, a whole number from 1' })
  .int('Version must be a whole number from 1')
  .min(1, 'Version must be a whole number from 1');

type LooseStops = { readingADeg?: unknown; readingBDeg?: unknown } | null | undefined;

/** A form's stop readings left blank mean "not measured" (null), not two bad numbers. */
function blankStopsAsNull(value: unknown): unknown {
  const stops = value as LooseStops;
  const blank = (v: unknown) => v === null || v === undefined || v === '';
  return stops && blank(stops.readingADeg) && blank(stops.readingBDeg) ? null : value;
}

/** A form's port rows whose height was left blank are dropped: the template names them, not every one gets measured. */
function withoutBlankPorts(value: unknown): unknown {
  return Array.isArray(value) ? value.filter((p: { heightMm?: unknown }) => p?.heightMm !== null && p?.heightMm !== '') : value;
}

/** The form edits a whole record and carries the version it was loaded at (absent when creating). */
export const buildFormSchema = withCrossFieldRules(
  z.object({
    ...shapeOf(buildFields),
    stops: z.preprocess(blankStopsAsNull, buildFields.stops.schema),
    ports: z.preprocess(withoutBlankPorts, buildFields.ports.schema),
    version: buildVersionSchema.optional(),
  }),
);

/** PATCH body: the version the edit started from plus any fields to change (`null` clears a measurement). */
export const buildPatchSchema = z
  .object({ version: buildVersionSchema, ...shapeOf(buildFields) })
  .partial()
  .required({ version: true })
  .strict();

/**
 * Merges a patch into the stored fields. The timing is entered one way: a patch that
 * sets one figure clears the other, which the record then computes.
 */
export function mergeBuildPatch(before: BuildFields, changes: Partial<BuildFields>): BuildFields {
  const after: BuildFields = { ...before, ...changes };
  if (changes.timingSetDegBTDC != null && !('timingSetMmBTDC' in changes)) after.timingSetMmBTDC = null;
  if (changes.timingSetMmBTDC != null && !('timingSetDegBTDC' in changes)) after.timingSetDegBTDC = null;
  return after;
}
