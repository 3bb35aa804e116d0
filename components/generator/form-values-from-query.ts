import { prefillFromSearchParams, type IgnoredParam } from '@/lib/generator-prefill';
import { UNIT_PARAM } from '@/lib/sheet-link-params';
import type { SheetRequestInput } from '@/lib/sheet/sheet-request';
import { DEFAULT_FORM_VALUES, type GeneratorFormValues } from './form-values';

/** Form values from the URL prefill (already validated field by field); lengths arrive in mm. */
export function formValuesFromPrefill(prefill: Partial<SheetRequestInput>): GeneratorFormValues {
  const { advanceMarksDeg, windowCrankDeg, advanceBandDeg, portEvents, ...rest } = prefill;
  const values = { ...DEFAULT_FORM_VALUES };
  for (const [key, value] of Object.entries(rest)) {
    if (value !== undefined && key in values) (values as Record<string, unknown>)[key] = value;
  }
  if (advanceMarksDeg) values.advanceMarksDeg = advanceMarksDeg.join(', ');
  if (windowCrankDeg) values.windowCrankDeg = [...windowCrankDeg];
  if (advanceBandDeg) values.advanceBandDeg = [...advanceBandDeg];
  if (portEvents) values.portEvents = portEvents.map((event) => ({ ...event }));
  if (prefill.kind === 'ring' && prefill.carrier === undefined) values.carrier = 'stationary';
  return values;
}

/** The form for a sheet maker query string: every value checked on its own, the bad ones reported, lengths shown in the unit the query names. */
export function formValuesFromQuery(params: URLSearchParams): { values: GeneratorFormValues; ignored: IgnoredParam[] } {
  const prefill = prefillFromSearchParams(params);
  const values = formValuesFromPrefill(prefill.values);
  if (params.get(UNIT_PARAM) === 'in') values.lengthUnit = 'in';
  return { values, ignored: prefill.ignored };
}
