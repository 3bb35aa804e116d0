'use client';

export default function ErrorPage({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return (
    <section role="alert" className="py-16 text-center">
      <h1 className="text-2xl font-bold">Something went wrong</h1>
      <p className="mt-2 text-steel-600 dark:text-steel-300">
        The page could not be shown{error.digest ? ` (reference ${error.digest})` : ''}. Nothing you entered was saved
        half-way.
      </p>
      <button type="button" onClick={reset} className="mt-4 rounded bg-gauge-600 px-4 py-2 text-white">
        Try again
      </button>
    </section>
  );
}
