import { cookies } from 'next/headers';
import { GeneratorForm, type FieldLabels } from '@/components/generator/generator-form';
import { formValuesFromQuery } from '@/components/generator/form-values-from-query';
import { generatorWorkspaceProfiles } from '@/app/lib/generator-workspace';
import { resolveSheetLink } from '@/lib/sheet-link';
import { SHEET_COOKIE } from '@/lib/sheet-link-params';
import { sheetRequestFields as fields } from '@/lib/sheet/sheet-request-fields';

/** Read from the field table here on the server, so the browser's form needs no schema to label its fields. */
const FIELD_LABELS: FieldLabels = {
  diameterMm: fields.diameterMm.label,
  hubHoleMm: fields.hubHoleMm.label,
  innerDiameterMm: fields.innerDiameterMm.label,
  outerDiameterMm: fields.outerDiameterMm.label,
  stripWidthMm: fields.stripWidthMm.label,
  targetAdvanceDeg: fields.targetAdvanceDeg.label,
  strobeReadable: fields.strobeReadable.label,
};

type SearchParams = Promise<Record<string, string | string[] | undefined>>;

function toSearchParams(raw: Record<string, string | string[] | undefined>): URLSearchParams {
  const params = new URLSearchParams();
  for (const [name, value] of Object.entries(raw)) {
    const first = Array.isArray(value) ? value[0] : value;
    if (first !== undefined) params.set(name, first);
  }
  return params;
}

function storedSheet(text: string | undefined): URLSearchParams | null {
  if (!text) return null;
  try {
    return new URLSearchParams(decodeURIComponent(text));
  } catch {
    return null;
  }
}

/**
 * The sheet generator: public, no sign-in. The form lives in the query string (a reload or a shared link shows
 * the same sheet); links from the calculators and templates add to the browser's last sheet (lib/sheet-link.ts).
 * A signed-in member is offered their workspace's printer profiles (`?workspace=`), its default chosen first.
 */
export default async function HomePage({ searchParams }: { searchParams: SearchParams }) {
  const link = toSearchParams(await searchParams);
  const { params, notices } = resolveSheetLink(link, storedSheet((await cookies()).get(SHEET_COOKIE)?.value));
  const { values, ignored } = formValuesFromQuery(params);
  const workspace = await generatorWorkspaceProfiles(params.get('workspace') ?? undefined);
  return (
    <div className="space-y-6">
      <header className="max-w-3xl space-y-2">
        <h1 className="text-2xl font-bold tracking-tight text-steel-900 dark:text-steel-50">Print a true-scale timing scale</h1>
        <p className="text-steel-600 dark:text-steel-300">
          Measure the flywheel, choose a degree wheel, flange ring or rim strip, and print it at actual size. The preview follows
          your figures as you type; check your printer once and every sheet is corrected for it.
        </p>
      </header>
      <GeneratorForm key={params.toString()} defaultValues={values} fieldLabels={FIELD_LABELS} ignored={ignored} notices={notices} workspace={workspace} />
    </div>
  );
}
