import Link from 'next/link';
import { useTranslations } from 'next-intl';

export default function Forbidden() {
  const t = useTranslations('Errors');
  return (
    <main className="mx-auto max-w-lg p-6 text-center">
      <h1 className="text-gate-xl font-bold">{t('forbidden')}</h1>
      <p className="mt-3 text-gate">{t('forbiddenText')}</p>
      <Link
        href="/"
        className="mt-6 inline-flex min-h-tap items-center rounded-lg bg-brand px-5 text-gate font-bold text-on-fill"
      >
        {t('start')}
      </Link>
    </main>
  );
}
