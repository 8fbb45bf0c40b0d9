import type { Metadata } from 'next';
import { getTranslations } from 'next-intl/server';
import { LanguageSwitch } from '@/app/_components/language-switch';
import { ForgetCachedPages } from '@/app/_components/offline/forget-cached-pages';
import { cookies } from 'next/headers';
import { redirect } from 'next/navigation';
import { ThemeSwitch } from '@/app/_components/theme-switch';
import { homeFor } from '@/lib/auth/roles';
import { currentUser } from '@/lib/server/auth';
import { parseTheme, THEME_COOKIE } from '@/lib/theme/theme';
import { SignInForm } from './_components/sign-in-form';

export async function generateMetadata(): Promise<Metadata> {
  return { title: (await getTranslations('Login'))('title') };
}

export default async function LoginPage({ searchParams }: PageProps<'/login'>) {
  const user = await currentUser();
  if (user) redirect(homeFor(user.role));
  const params = await searchParams;
  const t = await getTranslations('Login');
  const theme = parseTheme((await cookies()).get(THEME_COOKIE)?.value);
  const next = typeof params.next === 'string' ? params.next : undefined;
  return (
    <main className="mx-auto flex min-h-screen max-w-md flex-col justify-center p-4">
      <LanguageSwitch className="mb-4" />
      <p className="text-gate-xl font-bold text-brand">Hitchmark</p>
      <h1 className="mt-1 text-gate-lg font-bold">{t('title')}</h1>
      <p className="text-gate-sm text-ink-soft">{t('tagline')}</p>
      <SignInForm next={next} />
      <ThemeSwitch initial={theme} className="mt-6" />
      <ForgetCachedPages />
    </main>
  );
}
