'use client';

/** The friendly failure page of every section: says nothing was lost, offers a retry, shows no internals. */
export function ErrorView({ reset }: { reset: () => void }) {
  return (
    <main className="mx-auto max-w-lg p-8 text-center">
      <h1 className="text-2xl font-bold">Something went wrong</h1>
      <p className="mt-2 text-slate-600">
        Nothing you entered was lost. Try again; if it keeps happening, tell your office.
      </p>
      <button type="button" onClick={reset} className="mt-6 rounded-md bg-brand-700 px-4 py-2 font-semibold text-white">
        Try again
      </button>
    </main>
  );
}
