'use client';

import { Button } from '@/app/_components/button';

export function PrintButton() {
  return (
    <Button type="button" onClick={() => window.print()}>
      Print labels
    </Button>
  );
}
