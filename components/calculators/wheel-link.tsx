import Link from 'next/link';

/** "Use on a wheel": opens the sheet maker on `/` with this result filled in. */
export function WheelLink({ href, children }: { href: string | null; children: React.ReactNode }) {
  if (!href) return null;
  return (
    <Link
      href={href}
      className="inline-flex items-center gap-2 rounded-md bg-spark-500 px-3 py-1.5 text-sm font-semibold text-steel-950 shadow-sm hover:bg-spark-400 focus-visible:ring-2 focus-visible:ring-gauge-500"
    >
      <span aria-hidden>◔</span>
      {children}
    </Link>
  );
}
