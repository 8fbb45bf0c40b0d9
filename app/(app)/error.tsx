'use client';

import { useTranslations } from 'next-intl';
import { Button } from '@/app/_components/button';
import { ErrorDigest } from '@/app/_components/error-digest';

export default function SectionError({
  error,
  reset,
}: {
  error: Error & { digest?: string };
  reset: () => void;
}) {
  const t = useTranslations('Errors');
  return (
    <div role="alert" className="rounded-xl border-2 border-danger bg-danger-bg p-4">
      <h1 className="text-gate-lg font-bold text-danger">{t('error')}</h1>
      <p className="mt-1 text-gate">{t('errorText')}</p>
      <Button type="button" className="mt-3" onClick={() => reset()}>
        {t('again')}
      </Button>
      <ErrorDigest digest={error.digest} />
    </div>
  );
}
