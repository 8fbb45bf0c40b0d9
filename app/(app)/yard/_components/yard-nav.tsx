import Link from 'next/link';

const LINKS = [
  { href: '/yard', label: 'Board' },
  { href: '/yard/moves', label: 'Move' },
  { href: '/yard/walks', label: 'Walk' },
  { href: '/yard/tasks', label: 'Tasks' },
] as const;

/** Sub-navigation of the yard section; `current` is the href of the page showing. */
export function YardNav({ current }: { current: (typeof LINKS)[number]['href'] }) {
  return (
    <nav aria-label="Yard" className="no-print mb-3 flex gap-2 overflow-x-auto">
      {LINKS.map((l) => (
        <Link
          key={l.href}
          href={l.href}
          aria-current={l.href === current ? 'page' : undefined}
          className={`flex min-h-tap items-center rounded-lg border-2 px-4 text-gate font-bold ${l.href === current ? 'border-brand bg-brand text-on-fill' : 'border-paper-line bg-paper text-brand'}`}
        >
          {l.label}
        </Link>
      ))}
    </nav>
  );
}
