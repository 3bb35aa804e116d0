import { buildCrossFieldIssues } from './build-schema';
import { buildResults, type BuildResults } from './build-results';
import { buildFields, PORT_HEIGHT_RANGE_MM, type BuildFields } from './build-fields';

/** Loosely typed form values while the user is typing: numbers may be null, NaN or out of range. */
type Loose = { [K in keyof BuildFields]?: unknown };

const finite = (v: unknown): number | null => (typeof v === 'number' && Number.isFinite(v) ? v : null);
const inRange = (v: number | null, min: number, max: number) => (v !== null && v >= min && v <= max ? v : null);
type RangedKey = 'strokeMm' | 'rodMm' | 'pinOffsetMm' | 'deckMm' | 'timingSetDegBTDC' | 'timingSetMmBTDC';
/** A figure within its field's range (the field table's), else null. */
const ranged = (key: RangedKey, v: unknown) => inRange(finite(v), buildFields[key].min!, buildFields[key].max!);

/**
 * The results of what the form holds right now, with the same functions the server stores
 * them with; whatever is blank, bad or out of range is left out (its field shows why), so the
 * panel never shows NaN.
 */
export function liveResults(values: Loose, toleranceDeg: number): BuildResults {
  const stops = values.stops as { numbering?: unknown; readingADeg?: unknown; readingBDeg?: unknown; readingASide?: unknown; readingBSide?: unknown } | null;
  const a = inRange(finite(stops?.readingADeg), 0, 360);
  const b = inRange(finite(stops?.readingBDeg), 0, 360);
  const numbering = stops?.numbering === 'split' ? 'split' : 'full';
  const side = (s: unknown) => (s === 'BTDC' || s === 'ATDC' ? s : undefined);
  const ports = (Array.isArray(values.ports) ? values.ports : []).flatMap((p: { name?: unknown; heightMm?: unknown }) => {
    const heightMm = inRange(finite(p?.heightMm), PORT_HEIGHT_RANGE_MM.min, PORT_HEIGHT_RANGE_MM.max);
    return heightMm === null ? [] : [{ name: String(p?.name ?? '') || 'Port', heightMm }];
  });
  const targets = (Array.isArray(values.portTargets) ? values.portTargets : []).filter(
    (t: { opensCrankDeg?: unknown; closesCrankDeg?: unknown }) => finite(t?.opensCrankDeg) !== null && finite(t?.closesCrankDeg) !== null,
  );
  const fields = {
    strokeMm: ranged('strokeMm', values.strokeMm),
    rodMm: ranged('rodMm', values.rodMm),
    pinOffsetMm: ranged('pinOffsetMm', values.pinOffsetMm) ?? 0,
    deckMm: ranged('deckMm', values.deckMm),
    stops: a !== null && b !== null && (a !== b || numbering === 'split') ? { numbering, readingADeg: a, readingBDeg: b, readingASide: side(stops?.readingASide), readingBSide: side(stops?.readingBSide) } : null,
    timingSetDegBTDC: ranged('timingSetDegBTDC', values.timingSetDegBTDC),
    timingSetMmBTDC: ranged('timingSetMmBTDC', values.timingSetMmBTDC),
    ports,
    portTargets: targets,
  } as unknown as BuildFields;
  const problems = buildCrossFieldIssues({ ...fields, timingCheck: null, timingCheckRpm: null } as BuildFields).map((i) => i.path);
  if (problems.includes('rodMm') || problems.includes('pinOffsetMm')) fields.rodMm = null;
  if (problems.includes('timingSetMmBTDC')) fields.timingSetMmBTDC = null;
  return buildResults(fields, toleranceDeg);
}
