'use client';

import { Button } from '@/app/_components/button';
import { ErrorDigest } from '@/app/_components/error-digest';

export default function SectionError({
  error,
  reset,
}: {
  error: Error & { digest?: string };
  reset: () => void;
}) {
  return (
    <div role="alert" className="rounded-xl border-2 border-danger bg-danger-bg p-4">
      <h1 className="text-gate-lg font-bold text-danger">Something went wrong on our side</h1>
      <p className="mt-1 text-gate">The problem has been logged. Nothing was saved twice. Try again.</p>
      <Button type="button" className="mt-3" onClick={() => reset()}>
        Try again
      </Button>
      <ErrorDigest digest={error.digest} />
    </div>
  );
}
