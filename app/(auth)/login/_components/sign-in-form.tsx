'use client';

import { useTranslations } from 'next-intl';
import { useActionState, useState } from 'react';
import { Button } from '@/app/_components/button';
import { Field, FormError } from '@/app/_components/field';
import { FormStateProvider } from '@/app/_components/form-state';
import { IDLE } from '@/lib/result';
import { signInAction } from '../../actions';

type Method = 'driver' | 'staff';

export function SignInForm({ next }: { next?: string }) {
  const [state, formAction, pending] = useActionState(signInAction, IDLE);
  const [method, setMethod] = useState<Method>('driver');
  const t = useTranslations('Login');
  return (
    <div className="mt-6 rounded-xl bg-paper p-4 shadow">
      <div role="tablist" aria-label={t('how')} className="grid grid-cols-2 gap-2">
        {(['driver', 'staff'] as const).map((m) => (
          <button
            key={m}
            type="button"
            role="tab"
            aria-selected={method === m}
            onClick={() => setMethod(m)}
            className={`min-h-tap rounded-lg text-gate font-bold ${method === m ? 'bg-brand text-on-fill' : 'bg-paper-dim text-ink'}`}
          >
            {t(m)}
          </button>
        ))}
      </div>
      <FormStateProvider value={state}>
        <form action={formAction} noValidate className="mt-4 space-y-2" key={method}>
          <input type="hidden" name="method" value={method} />
          {next ? <input type="hidden" name="next" value={next} /> : null}
          {method === 'driver' ? (
            <>
              <Field
                label={t('driverNumber')}
                name="driverNumber"
                autoComplete="username"
                autoCapitalize="characters"
                required
              />
              <Field
                label={t('pin')}
                name="pin"
                type="password"
                inputMode="numeric"
                autoComplete="current-password"
                required
              />
            </>
          ) : (
            <>
              <Field label={t('email')} name="email" type="email" autoComplete="username" required />
              <Field
                label={t('password')}
                name="password"
                type="password"
                autoComplete="current-password"
                required
              />
            </>
          )}
          <FormError message={state.formError} />
          <Button type="submit" disabled={pending} className="w-full">
            {pending ? t('pending') : t('submit')}
          </Button>
        </form>
      </FormStateProvider>
    </div>
  );
}
