'use client';

import { useActionState } from 'react';
import { Button } from '@/app/_components/button';
import { Field, FormError } from '@/app/_components/field';
import { RATE_CONDITIONS } from '@/lib/validation/desk';
import { addRateAction, changeRateAction, type RateState } from '../actions';

export function AddRateForm() {
  const [state, action, isPending] = useActionState<RateState, FormData>(addRateAction, { ok: false });
  const e = state.fieldErrors ?? {};
  return (
    <form
      action={action}
      className="grid gap-2 rounded-xl bg-paper p-3 sm:grid-cols-4 sm:items-end"
      aria-label="Add a rate"
    >
      <Field
        label="Item key or prefix"
        name="itemPattern"
        required
        error={e.itemPattern}
        placeholder="rear.door_left"
      />
      <div>
        <label htmlFor="condition" className="block text-gate font-bold">
          Condition
        </label>
        <select
          id="condition"
          name="condition"
          className="mt-1 block min-h-tap w-full rounded-lg border-2 border-paper-line bg-paper px-2 text-gate"
        >
          {RATE_CONDITIONS.map((c) => (
            <option key={c}>{c}</option>
          ))}
        </select>
        <p className="min-h-6 text-gate-sm font-bold text-danger">{e.condition?.[0] ?? ''}</p>
      </div>
      <Field label="Amount ($)" name="amount" inputMode="decimal" required error={e.amount} />
      <div className="pb-7">
        <Button type="submit" disabled={isPending}>
          Add rate
        </Button>
      </div>
      <div className="sm:col-span-4">
        <FormError message={state.formError} />
        {state.ok ? (
          <p role="status" className="font-bold text-ok">
            {state.message}
          </p>
        ) : null}
      </div>
    </form>
  );
}

export function ChangeRateForm({ id, label, amount }: { id: string; label: string; amount: string }) {
  const [state, action, isPending] = useActionState<RateState, FormData>(changeRateAction, { ok: false });
  return (
    <form action={action} className="flex flex-wrap items-center gap-2" aria-label={`Change ${label}`}>
      <input type="hidden" name="id" value={id} />
      <label className="sr-only" htmlFor={`amount-${id}`}>
        Amount for {label} ($)
      </label>
      <input
        id={`amount-${id}`}
        name="amount"
        defaultValue={amount}
        inputMode="decimal"
        required
        aria-invalid={state.fieldErrors?.amount ? true : undefined}
        className="min-h-tap w-32 rounded-lg border-2 border-paper-line px-2 text-gate aria-[invalid=true]:border-danger"
      />
      <Button type="submit" variant="secondary" disabled={isPending}>
        Save
      </Button>
      <span aria-live="polite" className="text-gate-sm font-bold">
        {state.ok ? (
          <span className="text-ok">{state.message}</span>
        ) : (
          <span className="text-danger">{state.fieldErrors?.amount?.[0] ?? state.formError ?? ''}</span>
        )}
      </span>
    </form>
  );
}
