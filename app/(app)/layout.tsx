import Link from 'next/link';
import { cookies } from 'next/headers';
import { ThemeSwitch } from '@/app/_components/theme-switch';
import { getTranslations } from 'next-intl/server';
import { LanguageSwitch } from '@/app/_components/language-switch';
import { canOpen, type Section } from '@/lib/auth/roles';
import { requireUser } from '@/lib/server/auth';
import { parseTheme, THEME_COOKIE } from '@/lib/theme/theme';
import { OfflineProvider, OutboxLine } from '@/app/_components/offline/offline-provider';
import { PhotoPolicyProvider } from '@/app/_components/photo-policy';
import { getPhotoPolicy } from '@/db/queries/photo-policy';
import { NavLinks } from './_components/nav-links';
import { SignOutButton } from './_components/sign-out-button';

const SECTIONS: Section[] = ['gate', 'yard', 'desk', 'trailers', 'admin'];

// The signed-in shell. Not a security check: every page and action checks for itself.
export default async function AppLayout({ children }: { children: React.ReactNode }) {
  const user = await requireUser();
  const theme = parseTheme((await cookies()).get(THEME_COOKIE)?.value);
  const t = await getTranslations('Shell');
  const photoPolicy = await getPhotoPolicy(user.terminalId);
  const account = await getTranslations('Account');
  const links = SECTIONS.filter((s) => canOpen(user.role, s)).map((s) => ({
    href: `/${s}`,
    label: t(`section.${s}`),
  }));
  return (
    <OfflineProvider userId={user.id}>
      <div className="min-h-screen">
        <a
          href="#main"
          className="sr-only focus:not-sr-only focus:absolute focus:left-2 focus:top-2 focus:bg-paper focus:p-2"
        >
          {t('skip')}
        </a>
        <header className="no-print bg-brand text-on-fill">
          <div className="mx-auto flex max-w-6xl flex-wrap items-center gap-x-4 gap-y-1 px-3 py-2">
            <Link href="/" className="inline-flex min-h-tap items-center text-gate-lg font-bold">
              Hitchmark
            </Link>
            <NavLinks links={links} label={t('sections')} />
            <div className="ml-auto flex flex-wrap items-center gap-3 text-gate-sm">
              <ThemeSwitch initial={theme} onFill />
              <LanguageSwitch onFill />
              <span>
                <Link
                  href="/account"
                  className="inline-flex min-h-tap items-center font-bold underline"
                  title={account('linkLabel')}
                >
                  {user.name}
                </Link>{' '}
                · {t(`role.${user.role}`)}
                {user.carrierScac ? ` · ${user.carrierScac}` : ''}
              </span>
              <SignOutButton label={t('signOut')} />
            </div>
          </div>
        </header>
        <OutboxLine />
        <main id="main" className="mx-auto max-w-6xl p-3 sm:p-4">
          <PhotoPolicyProvider policy={photoPolicy}>{children}</PhotoPolicyProvider>
        </main>
      </div>
    </OfflineProvider>
  );
}
