import type { Metadata } from 'next';
import { getTranslations } from 'next-intl/server';
import { ActionForm } from '@/app/_components/action-form';
import { Field } from '@/app/_components/field';
import { getUserEmail } from '@/db/queries/users';
import { requireUser } from '@/lib/server/auth';
import { EMAIL_MAX, NEW_PASSWORD_MIN } from '@/lib/validation/account';
import { changeEmailAction, changePasswordAction, changePinAction } from './actions';

export async function generateMetadata(): Promise<Metadata> {
  return { title: (await getTranslations('Account'))('title') };
}

/** Any signed-in person: change their own PIN (drivers) or password (staff); drivers keep a receipt address. */
export default async function AccountPage() {
  const user = await requireUser();
  const t = await getTranslations('Account');
  const isDriver = user.role === 'driver';
  const email = isDriver ? await getUserEmail(user.id) : null;
  return (
    <div className="max-w-xl space-y-4">
      <h1 className="text-gate-xl font-bold">{t('title')}</h1>
      <p className="text-gate">{t('signedOutElsewhere')}</p>
      {isDriver ? (
        <section className="rounded-xl bg-paper p-4">
          <ActionForm
            action={changeEmailAction}
            title={t('emailTitle')}
            submitLabel={t('saveEmail')}
            pendingLabel={t('saving')}
          >
            <Field
              label={t('email')}
              hint={t('emailHint')}
              name="email"
              type="email"
              autoComplete="email"
              maxLength={EMAIL_MAX}
              defaultValue={email ?? ''}
            />
          </ActionForm>
        </section>
      ) : null}
      <section className="rounded-xl bg-paper p-4">
        {isDriver ? (
          <ActionForm
            action={changePinAction}
            title={t('changePin')}
            submitLabel={t('savePin')}
            pendingLabel={t('saving')}
          >
            <Field
              label={t('currentPin')}
              name="currentPin"
              type="password"
              inputMode="numeric"
              autoComplete="current-password"
              required
            />
            <Field
              label={t('newPin')}
              hint={t('pinRule')}
              name="newPin"
              type="password"
              inputMode="numeric"
              autoComplete="new-password"
              required
            />
            <Field
              label={t('repeatPin')}
              name="repeatPin"
              type="password"
              inputMode="numeric"
              autoComplete="new-password"
              required
            />
          </ActionForm>
        ) : (
          <ActionForm
            action={changePasswordAction}
            title={t('changePassword')}
            submitLabel={t('savePassword')}
            pendingLabel={t('saving')}
          >
            <Field
              label={t('currentPassword')}
              name="currentPassword"
              type="password"
              autoComplete="current-password"
              required
            />
            <Field
              label={t('newPassword')}
              hint={t('passwordRule', { min: NEW_PASSWORD_MIN })}
              name="newPassword"
              type="password"
              autoComplete="new-password"
              required
            />
            <Field
              label={t('repeatPassword')}
              name="repeatPassword"
              type="password"
              autoComplete="new-password"
              required
            />
          </ActionForm>
        )}
      </section>
    </div>
  );
}
