import { useTranslations } from 'next-intl';

const STYLES: Record<string, string> = {
  open: 'bg-warn-bg text-warn',
  notified: 'bg-brand-light text-brand-dark',
  disputed: 'bg-danger-bg text-danger',
  decided: 'bg-ok-bg text-ok',
  closed: 'bg-paper-dim text-ink-soft',
};

export function CaseStateBadge({ state }: { state: string }) {
  const t = useTranslations('Desk');
  return (
    <span className={`inline-block rounded-full px-3 py-0.5 text-gate-sm font-bold ${STYLES[state] ?? ''}`}>
      {state in STYLES ? t(`state.${state as 'open'}`) : state}
    </span>
  );
}
