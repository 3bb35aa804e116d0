import { GeneratorForm } from '@/components/generator/generator-form';
import { formValuesFromPrefill } from '@/components/generator/form-values';
import { prefillFromSearchParams } from '@/lib/generator-prefill';
import { generatorWorkspaceProfiles } from '@/app/lib/generator-workspace';

type SearchParams = Promise<Record<string, string | string[] | undefined>>;

/**
 * The sheet generator: public, no sign-in. Links may prefill it through the query string; a signed-in
 * member is offered their workspace's printer profiles, its default chosen first.
 */
export default async function HomePage({ searchParams }: { searchParams: SearchParams }) {
  const params = await searchParams;
  const prefill = prefillFromSearchParams(params);
  const workspace = await generatorWorkspaceProfiles(typeof params.workspace === 'string' ? params.workspace : undefined);
  return (
    <div className="space-y-6">
      <header className="max-w-3xl space-y-2">
        <h1 className="text-2xl font-bold tracking-tight text-steel-900 dark:text-steel-50">Print a true-scale timing scale</h1>
        <p className="text-steel-600 dark:text-steel-300">
          Measure the flywheel, choose a degree wheel, flange ring or rim strip, and print it at actual size. The preview follows
          your figures as you type; check your printer once and every sheet is corrected for it.
        </p>
      </header>
      <GeneratorForm defaultValues={formValuesFromPrefill(prefill.values)} ignored={prefill.ignored} workspace={workspace} />
    </div>
  );
}
