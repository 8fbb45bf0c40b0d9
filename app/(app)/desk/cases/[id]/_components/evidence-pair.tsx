import { useLocale, useTranslations } from 'next-intl';
import type { CaseEvidence, CaseFinding } from '@/db/queries/case-evidence';
import { itemLabel } from '@/lib/desk/item-labels';
import { itemLabel as itemWords } from '@/lib/i18n/checklist';
import { CONDITION_LABELS, type Condition } from '@/lib/engine';
import { formatTime } from '@/lib/format/time';
import { PhotoZoom } from './photo-zoom';

type Side = {
  title: string;
  handoff: CaseEvidence['handoffs'][number] | undefined;
  item: CaseEvidence['items'][number] | undefined;
  photos: CaseEvidence['photos'];
};

function Record({ side, itemName, timeZone }: { side: Side; itemName: string; timeZone: string }) {
  const t = useTranslations('Case');
  const tph = useTranslations('Photos');
  const locale = useLocale();
  const { handoff, item } = side;
  return (
    <div className="min-w-0 space-y-2 rounded-lg border-2 border-paper-line p-2">
      <h4 className="text-gate-sm font-bold uppercase tracking-wide text-ink-soft">{side.title}</h4>
      {handoff ? (
        <p className="text-gate-sm">
          {handoff.kind === 'drop' ? t('drop') : t('hook')}{' '}
          {formatTime(handoff.occurredAt, timeZone, 'dateTime', locale)} · {handoff.driverName} (
          {handoff.carrierScac})
        </p>
      ) : (
        <p className="text-gate-sm text-ink-soft">{t('noEarlier')}</p>
      )}
      <p className="text-gate font-bold" data-testid="condition">
        {item ? (
          <span data-stored-text="">{CONDITION_LABELS[item.condition as Condition]}</span>
        ) : (
          t('notChecked')
        )}
      </p>
      {item?.note ? <p className="text-gate-sm">“{item.note}”</p> : null}
      {side.photos.length ? (
        <div className="grid grid-cols-1 gap-2 sm:grid-cols-2">
          {side.photos.map((p) => (
            <figure key={p.id} className="space-y-1">
              <PhotoZoom photoId={p.id} alt={`${itemName}, ${side.title.toLowerCase()}`} />
              <figcaption className="text-gate-sm" data-testid="photo-times">
                {p.capturedAt
                  ? tph('taken', { time: formatTime(p.capturedAt, timeZone, 'dateTime', locale) })
                  : tph('noCaptureTime')}{' '}
                · {tph('uploaded', { time: formatTime(p.uploadedAt, timeZone, 'dateTime', locale) })}
              </figcaption>
            </figure>
          ))}
        </div>
      ) : handoff ? (
        <p className="text-gate-sm text-ink-soft">{t('noPhoto')}</p>
      ) : null}
    </div>
  );
}

// `none`: the party line already says there is no single party; the confidence adds nothing
const CONFIDENCES = ['high', 'medium'] as const;
const isWorded = (c: string): c is (typeof CONFIDENCES)[number] =>
  (CONFIDENCES as readonly string[]).includes(c);

/** One damaged item: the before record (the inspection the engine compared against) and the after record, side by side. */
export function EvidencePair({
  finding,
  evidence,
  afterHandoffId,
  timeZone,
}: {
  finding: CaseFinding;
  evidence: CaseEvidence;
  afterHandoffId: string;
  timeZone: string;
}) {
  const t = useTranslations('Case');
  const name = itemWords(useLocale(), finding.itemKey, itemLabel(finding.itemKey));
  const sideOf = (title: string, handoffId: string | null): Side => ({
    title,
    handoff: evidence.handoffs.find((h) => h.id === handoffId),
    item: evidence.items.find((i) => i.handoffId === handoffId && i.itemKey === finding.itemKey),
    photos: evidence.photos.filter((p) => p.handoffId === handoffId && p.itemKey === finding.itemKey),
  });
  return (
    <article className="space-y-2 rounded-xl bg-paper p-3" aria-label={name}>
      <h3 className="text-gate-lg font-bold">
        {name}{' '}
        <span className="text-gate-sm font-normal text-ink-soft">
          ({finding.kind === 'worse' ? t('worse') : t('newDamage')})
        </span>
      </h3>
      <div className="grid grid-cols-2 gap-2" data-testid="evidence-pair">
        <Record side={sideOf(t('before'), finding.previousHandoffId)} itemName={name} timeZone={timeZone} />
        <Record side={sideOf(t('after'), afterHandoffId)} itemName={name} timeZone={timeZone} />
      </div>
      <p className="rounded-lg bg-brand-light p-2 text-gate">
        <span className="font-bold">
          {finding.responsibleCarrierName ?? finding.responsibleParty ?? t('noSingleParty')}
          {finding.confidence && isWorded(finding.confidence)
            ? ` · ${t(`confidence.${finding.confidence}`)}`
            : ''}
          :
        </span>{' '}
        <span data-stored-text="">{finding.reason}</span>
      </p>
    </article>
  );
}
