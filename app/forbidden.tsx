import Link from 'next/link';

export default function Forbidden() {
  return (
    <main className="mx-auto max-w-lg p-6 text-center">
      <h1 className="text-gate-xl font-bold">Not for your role</h1>
      <p className="mt-3 text-gate">
        You are signed in, but your role may not open this page. Ask a terminal manager if you need access.
      </p>
      <Link
        href="/"
        className="mt-6 inline-flex min-h-tap items-center rounded-lg bg-brand px-5 text-gate font-bold text-on-fill"
      >
        Go to my start page
      </Link>
    </main>
  );
}
