'use client';

import { useActionState, useState } from 'react';
import { Button } from '@/app/_components/button';
import { Field, FormError } from '@/app/_components/field';
import { signInAction, type SignInState } from '../../actions';

export function SignInForm({ next }: { next?: string }) {
  const [state, formAction, pending] = useActionState<SignInState, FormData>(signInAction, {
    ok: false,
    method: 'driver',
  });
  const [method, setMethod] = useState<'driver' | 'staff'>(state.method);
  const errors = state.fieldErrors ?? {};
  return (
    <div className="mt-6 rounded-xl bg-paper p-4 shadow">
      <div role="tablist" aria-label="How to sign in" className="grid grid-cols-2 gap-2">
        {(['driver', 'staff'] as const).map((m) => (
          <button
            key={m}
            type="button"
            role="tab"
            aria-selected={method === m}
            onClick={() => setMethod(m)}
            className={`min-h-tap rounded-lg text-gate font-bold ${method === m ? 'bg-brand text-white' : 'bg-paper-dim text-ink'}`}
          >
            {m === 'driver' ? 'Driver' : 'Terminal staff'}
          </button>
        ))}
      </div>
      <form action={formAction} noValidate className="mt-4 space-y-2" key={method}>
        <input type="hidden" name="method" value={method} />
        {next ? <input type="hidden" name="next" value={next} /> : null}
        {method === 'driver' ? (
          <>
            <Field
              label="Driver number"
              name="driverNumber"
              autoComplete="username"
              autoCapitalize="characters"
              required
              defaultValue={state.values?.driverNumber}
              error={errors.driverNumber}
            />
            <Field
              label="PIN"
              name="pin"
              type="password"
              inputMode="numeric"
              autoComplete="current-password"
              required
              error={errors.pin}
            />
          </>
        ) : (
          <>
            <Field
              label="E-mail"
              name="email"
              type="email"
              autoComplete="username"
              required
              defaultValue={state.values?.email}
              error={errors.email}
            />
            <Field
              label="Password"
              name="password"
              type="password"
              autoComplete="current-password"
              required
              error={errors.password}
            />
          </>
        )}
        <FormError message={state.formError} />
        <Button type="submit" disabled={pending} className="w-full">
          {pending ? 'Signing in…' : 'Sign in'}
        </Button>
      </form>
    </div>
  );
}
