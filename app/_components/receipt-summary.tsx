import { useLocale, useTranslations } from 'next-intl';
import { Caution } from '@/app/_components/caution';
import { formatStamp } from '@/lib/format/time';
import { findingWords, holdTitle, type ReceiptView } from '@/lib/handoffs/receipt';
import { formatVerificationCode } from '@/lib/handoffs/verification-code';
import { itemLabel } from '@/lib/i18n/checklist';

/** The receipt as the gate, the e-mail and the public verify page show it. Photos only where the viewer may see them. */
export function ReceiptSummary({ receipt: r, showPhotos }: { receipt: ReceiptView; showPhotos: boolean }) {
  const t = useTranslations('Common');
  const c = useTranslations('Cautions');
  const locale = useLocale();
  const isOutOfService = r.holds.some((h) => h.severity === 'out_of_service');
  return (
    <article className="space-y-4" aria-label={t('receipt.label')}>
      <div className="rounded-lg border-4 border-brand p-3 text-center">
        <p className="text-gate-sm font-bold">{t('receipt.code')}</p>
        <p
          className="font-mono text-[2.5rem] font-bold leading-tight tracking-widest"
          data-testid="verification-code"
        >
          {formatVerificationCode(r.verificationCode)}
        </p>
      </div>
      <dl className="grid grid-cols-[auto_1fr] gap-x-3 gap-y-1 text-gate">
        <dt className="font-bold">{t('receipt.trailer')}</dt>
        <dd>{r.unitNumber}</dd>
        <dt className="font-bold">{t('receipt.handoff')}</dt>
        <dd>
          {r.kind === 'drop' ? t('receipt.drop') : t('receipt.hook')}, {r.terminalName}
        </dd>
        <dt className="font-bold">{t('receipt.when')}</dt>
        <dd>{formatStamp(r.occurredAt, r.timeZone, locale)}</dd>
        <dt className="font-bold">{t('receipt.carrier')}</dt>
        <dd>{r.carrierName}</dd>
        <dt className="font-bold">{t('receipt.driver')}</dt>
        <dd>{t('receipt.driverLine', { driver: r.driverName, tractor: r.tractorNumber })}</dd>
        <dt className="font-bold">{t('receipt.load')}</dt>
        <dd>
          {r.isLoaded ? t('receipt.loaded') : t('receipt.empty')}
          {r.sealNumber ? `, ${t('receipt.seal', { seal: r.sealNumber })}` : ''}
        </dd>
        {r.fuelEighths !== null ? (
          <>
            <dt className="font-bold">{t('receipt.fuel')}</dt>
            <dd>{r.fuelEighths}/8</dd>
          </>
        ) : null}
        {r.spotLabel ? (
          <>
            <dt className="font-bold">{t('receipt.slot')}</dt>
            <dd>{r.spotLabel}</dd>
          </>
        ) : null}
      </dl>
      <section aria-labelledby="findings-title">
        <h2 id="findings-title" className="text-gate-xl font-bold">
          {t('receipt.findings')}
        </h2>
        {r.findings.length ? (
          <ul className="mt-1 space-y-2">
            {r.findings.map((f) => (
              <li key={`${f.kind}-${f.itemKey}`} className="rounded-lg bg-paper-dim p-2 text-gate">
                <span data-stored-text="">
                  <span className="font-bold">{findingWords(f.kind, locale)}:</span> {f.reason}
                </span>
              </li>
            ))}
          </ul>
        ) : (
          <p className="text-gate">{t('receipt.noChange')}</p>
        )}
      </section>
      <section aria-labelledby="holds-title">
        <h2 id="holds-title" className="text-gate-xl font-bold">
          {t('receipt.holds')}
        </h2>
        {r.holds.length ? (
          <ul className="mt-1 space-y-2">
            {r.holds.map((h) => (
              <li
                key={h.reason}
                className={`rounded-lg border-2 p-2 text-gate ${h.severity === 'out_of_service' ? 'border-danger bg-danger-bg text-danger' : 'border-hold bg-hold-bg text-hold'}`}
              >
                <span data-stored-text="">
                  <span className="font-bold">{holdTitle(h, locale)}.</span> {h.reason}
                </span>
              </li>
            ))}
          </ul>
        ) : (
          <p className="text-gate">{t('receipt.none')}</p>
        )}
        {isOutOfService ? (
          <div className="mt-2">
            <Caution title={c('titles.outOfService')}>{c('outOfService')}</Caution>
          </div>
        ) : null}
      </section>
      <section aria-labelledby="photos-title">
        <h2 id="photos-title" className="text-gate-xl font-bold">
          {t('receipt.photos', { count: r.photos.length })}
        </h2>
        {showPhotos && r.photos.length ? (
          <ul className="mt-1 flex flex-wrap gap-2">
            {r.photos.map((p) => (
              <li key={p.id}>
                <a href={`/api/photos/${p.id}`}>
                  {/* eslint-disable-next-line @next/next/no-img-element -- served by the app, checked and sized at upload */}
                  <img
                    src={`/api/photos/${p.id}`}
                    alt={
                      p.itemKey
                        ? t('receipt.photoOf', { item: itemLabel(locale, p.itemKey) })
                        : t('receipt.photo')
                    }
                    className="h-24 w-24 rounded border-2 border-paper-line object-cover"
                  />
                </a>
              </li>
            ))}
          </ul>
        ) : null}
      </section>
      <Caution title={c('titles.inspection')}>{c('inspection')}</Caution>
      <p className="break-all text-gate-sm text-ink-faint">{t('receipt.hash', { hash: r.contentHash })}</p>
    </article>
  );
}
