'use client';

import { useRouter } from 'next/navigation';
import { useCallback } from 'react';
import { TrailerScanner, type ScannedTrailer } from '@/app/_components/scanner/trailer-scanner';

/** The gate's way in: scan or type a trailer, then open its handoff start page. */
export function GateLookup() {
  const router = useRouter();
  const open = useCallback((t: ScannedTrailer) => router.push(`/gate/trailers/${t.id}`), [router]);
  return <TrailerScanner onTrailer={open} />;
}
