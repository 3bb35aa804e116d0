import Link from 'next/link';

export default function NotFound() {
  return (
    <section className="py-16 text-center">
      <h1 className="text-2xl font-bold">Not found</h1>
      <p className="mt-2 text-steel-600 dark:text-steel-300">There is nothing at this address, or it is not yours to see.</p>
      <Link href="/" className="mt-4 inline-block text-gauge-600 underline">
        Back to the sheet maker
      </Link>
    </section>
  );
}
