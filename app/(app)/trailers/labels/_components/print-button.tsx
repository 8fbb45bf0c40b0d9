'use client';

import { useTranslations } from 'next-intl';
import { Button } from '@/app/_components/button';

export function PrintButton({ label }: { label?: string }) {
  const t = useTranslations('Trailers');
  return (
    <Button type="button" onClick={() => window.print()}>
      {label ?? t('labels.print')}
    </Button>
  );
}
