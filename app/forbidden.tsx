import type { Metadata } from 'next';
import Link from 'next/link';
import { pageRefusal } from '@/app/lib/page-access';

export const metadata: Metadata = { title: 'Not allowed' };

/** The 403 page: what was refused, and what the visitor can do instead. */
export default async function Forbidden() {
  const { message, workspaceSlug } = await pageRefusal();
  const shop = workspaceSlug ? `/w/${workspaceSlug}` : '';
  return (
    <section className="mx-auto max-w-2xl space-y-4 py-12">
      <p className="font-mono text-sm text-steel-500">403 · not allowed</p>
      <h1 className="text-2xl font-bold">Your role does not open this page</h1>
      <p className="text-steel-700 dark:text-steel-300">{message ? `${message}.` : 'Your role in this workspace does not allow this page.'}</p>
      <h2 className="text-lg font-semibold">What you can do instead</h2>
      <ul className="list-disc space-y-2 pl-5 text-steel-700 dark:text-steel-300">
        {shop ? (
          <>
            <li>
              <Link href={`${shop}/templates`} className="text-gauge-700 underline dark:text-gauge-300">
                Read and print the engine templates
              </Link>{' '}
              — every role may.
            </li>
            <li>
              Ask an owner of the workspace for a role that allows this; the owners are listed on the{' '}
              <Link href={shop} className="text-gauge-700 underline dark:text-gauge-300">
                workspace page
              </Link>
              .
            </li>
          </>
        ) : null}
        <li>
          <Link href="/" className="text-gauge-700 underline dark:text-gauge-300">
            Make a sheet in the sheet maker
          </Link>
          , which needs no account.
        </li>
      </ul>
    </section>
  );
}
