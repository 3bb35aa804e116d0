import type { Metadata } from 'next';
import Link from 'next/link';
import { pageAction } from '@/app/lib/page-access';
import { ImportForm } from '@/components/templates/import-form';
import { CSV_COLUMNS, CSV_COLUMN_SPECS } from '@/lib/templates/csv-columns';

export const dynamic = 'force-dynamic';
export const metadata: Metadata = { title: 'Import templates' };

type Props = { params: Promise<{ workspace: string }> };

const EXAMPLE = `${CSV_COLUMNS.join(',')}
Sample 50 moped,50 cc piston-port,40,39.2,85,ccw,112,104,130,22,17,16;17;18,exhaust:92/268;transfer:118/242,,false`;

export default async function ImportTemplatesPage({ params }: Props) {
  const { workspace: slug } = await params;
  await pageAction(`/w/${slug}/templates/import`);
  return (
    <section className="max-w-4xl space-y-6">
      <div>
        <h1 className="text-2xl font-bold">Import templates from CSV</h1>
        <p className="text-sm text-steel-600 dark:text-steel-300">
          Every row is checked first. If any row has a problem, nothing is imported and each problem is listed by row (the header is row 1),
          column and rule. A file from <Link href={`/api/v1/workspaces/${slug}/templates/export`} className="underline">Export CSV</Link> imports back as the same templates.
        </p>
      </div>
      <ImportForm slug={slug} />
      <div className="space-y-2">
        <h2 className="text-lg font-semibold">Columns</h2>
        <p className="text-sm">
          Separated by commas, semicolons or tabs (found from the header row), UTF-8 text, a header row naming the columns (any order; only{' '}
          <code>name</code> is required). Decimal point is “.”; in a semicolon-separated file a decimal comma works too. An empty cell means “not
          known”. Check the file first: you see how many rows are new and how many have the name of an existing template, and choose to skip those
          rows or update the templates from them.
        </p>
        <table className="text-sm">
          <thead>
            <tr className="text-left">
              <th scope="col" className="pr-6">Column</th>
              <th scope="col">Meaning and allowed values</th>
            </tr>
          </thead>
          <tbody>
            {CSV_COLUMN_SPECS.map((spec) => (
              <tr key={spec.column} className="border-t border-steel-100 dark:border-steel-800">
                <td className="pr-6 font-mono">{spec.column}</td>
                <td>{spec.meaning}</td>
              </tr>
            ))}
          </tbody>
        </table>
        <h3 className="font-medium">Example</h3>
        <pre tabIndex={0} aria-label="Example: the header row and one template" className="overflow-x-auto rounded bg-steel-100 p-3 text-xs dark:bg-steel-900">{EXAMPLE}</pre>
      </div>
    </section>
  );
}
