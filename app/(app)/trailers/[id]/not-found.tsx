import { useTranslations } from 'next-intl';
import { EmptyState } from '@/app/_components/empty-state';

export default function TrailerNotFound() {
  const t = useTranslations('Trailers');
  return <EmptyState title={t('file.noSuch')}>{t('file.noSuchText')}</EmptyState>;
}
