import Link from 'next/link';

/** The first cell of a list row: the record's name, linking to its page. */
export function RecordLink({ href, children }: { href: string; children: React.ReactNode }) {
  return (
    <Link href={href} className="font-medium text-gauge-700 underline dark:text-gauge-300">
      {children}
    </Link>
  );
}
