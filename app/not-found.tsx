import Link from 'next/link';

export default function NotFound() {
  return (
    <main className="mx-auto max-w-lg p-6 text-center">
      <h1 className="text-gate-xl font-bold">Not found</h1>
      <p className="mt-3 text-gate">
        There is nothing at this address. The trailer, case or page may have been removed.
      </p>
      <Link
        href="/"
        className="mt-6 inline-flex min-h-tap items-center rounded-lg bg-brand px-5 text-gate font-bold text-on-fill"
      >
        Back to Hitchmark
      </Link>
    </main>
  );
}
