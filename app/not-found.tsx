import Link from 'next/link';

export default function NotFound() {
  return (
    <main className="mx-auto max-w-lg p-8 text-center">
      <h1 className="text-2xl font-bold">Not found</h1>
      <p className="mt-2 text-slate-600">There is nothing here, or it belongs to another company.</p>
      <Link href="/" className="mt-6 inline-block font-semibold text-brand-700 underline">
        Go to your start page
      </Link>
    </main>
  );
}
