'use client';

import Link from 'next/link';
import { usePathname } from 'next/navigation';

export function NavLinks({ links, label }: { links: { href: string; label: string }[]; label: string }) {
  const pathname = usePathname();
  return (
    <nav aria-label={label} className="order-last flex w-full gap-1 overflow-x-auto sm:order-none sm:w-auto">
      {links.map((l) => {
        const active = pathname === l.href || pathname.startsWith(`${l.href}/`);
        return (
          <Link
            key={l.href}
            href={l.href}
            aria-current={active ? 'page' : undefined}
            className={`flex min-h-tap items-center rounded-lg px-3 text-gate font-bold ${active ? 'bg-paper text-brand' : 'hover:bg-brand-dark'}`}
          >
            {l.label}
          </Link>
        );
      })}
    </nav>
  );
}
