import Link from 'next/link';
import { useTranslations } from 'next-intl';

const LINKS = [
  { href: '/yard', label: 'board' },
  { href: '/yard/moves', label: 'move' },
  { href: '/yard/walks', label: 'walk' },
  { href: '/yard/tasks', label: 'tasks' },
] as const;

/** Sub-navigation of the yard section; `current` is the href of the page showing. */
export function YardNav({ current }: { current: (typeof LINKS)[number]['href'] }) {
  const t = useTranslations('Yard');
  return (
    <nav aria-label={t('nav.label')} className="no-print mb-3 flex gap-2 overflow-x-auto">
      {LINKS.map((l) => (
        <Link
          key={l.href}
          href={l.href}
          aria-current={l.href === current ? 'page' : undefined}
          className={`flex min-h-tap items-center rounded-lg border-2 px-4 text-gate font-bold ${l.href === current ? 'border-brand bg-brand text-on-fill' : 'border-paper-line bg-paper text-brand'}`}
        >
          {t(`nav.${l.label}`)}
        </Link>
      ))}
    </nav>
  );
}
