'use client';

import { Button } from '@/app/_components/button';

export function PrintButton({ label = 'Print labels' }: { label?: string }) {
  return (
    <Button type="button" onClick={() => window.print()}>
      {label}
    </Button>
  );
}
