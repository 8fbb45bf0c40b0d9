'use client';

import { useTranslations } from 'next-intl';
import { useState } from 'react';
import { useOutboxItems } from './offline/offline-provider';
import { addToOutbox } from './offline/outbox-client';
import { PhotoRefused, sendPhoto, type PreparedPhoto } from './offline/photo-send';
import { useRefusalText } from './use-refusal-text';
import { isSaneCaptureTime, readCaptureTime } from '@/lib/photos/capture-time';
import type { PhotoPolicy } from '@/lib/photos/policy';
import { usePhotoPolicy } from './photo-policy';

/** A photo that reached storage and passed the server's checks. */
export type CapturedPhoto = { id: string };

type Stage = 'shrinking' | 'sending' | 'checking' | 'failed';
/** One photo on its way; `id` is the photo's own id, chosen on the phone. */
type Job = {
  id: string;
  file: File;
  stage: Stage;
  percent: number;
  error?: string;
  prepared?: PreparedPhoto;
};

async function sha256Hex(bytes: ArrayBuffer): Promise<string> {
  const digest = await crypto.subtle.digest('SHA-256', bytes);
  return [...new Uint8Array(digest)].map((b) => b.toString(16).padStart(2, '0')).join('');
}

/**
 * Camera photo → capture time from its EXIF (before shrinking strips it) → shrunk on the phone
 * to the terminal's longest side and quality → SHA-256. Needs no signal.
 */
async function preparePhoto(
  file: File,
  where: { photoId: string; trailerId: string; itemKey: string },
  policy: PhotoPolicy,
  onProgress: (percent: number) => void,
): Promise<PreparedPhoto> {
  const now = new Date();
  const taken = await readCaptureTime(file, -now.getTimezoneOffset());
  const capturedAt = taken && isSaneCaptureTime(taken, now) ? taken.toISOString() : null;
  // loaded with the first photo, not with the page (the handoff form's first-load budget)
  const { default: imageCompression } = await import('browser-image-compression');
  const small = await imageCompression(file, {
    maxWidthOrHeight: policy.longestSidePx,
    initialQuality: policy.quality,
    fileType: 'image/jpeg',
    // the worker build loads the library from a CDN: not on a phone without signal, not under our CSP
    useWebWorker: false,
    onProgress: (p) => onProgress(Math.round(p * 0.3)),
  });
  const bytes = await small.arrayBuffer();
  const contentType = small.type || 'image/jpeg';
  return {
    ...where,
    contentType,
    byteSize: bytes.byteLength,
    sha256: await sha256Hex(bytes),
    capturedAt,
    bytes,
  };
}

/**
 * Takes photos of one checklist item and uploads each with its own progress line and a Try again
 * button when it fails; the gate form and the desk's dispute form use it.
 */
export function PhotoCapture({
  trailerId,
  itemKey,
  label,
  photos,
  onAdd,
  policy: givenPolicy,
}: {
  trailerId: string;
  itemKey: string;
  label: string;
  photos: CapturedPhoto[];
  onAdd: (p: CapturedPhoto) => void;
  /** The terminal's figures; by default those of the signed-in user's terminal (the shell's). */
  policy?: PhotoPolicy;
}) {
  const terminalPolicy = usePhotoPolicy();
  const policy = givenPolicy ?? terminalPolicy;
  const t = useTranslations('Photos');
  const say = useRefusalText();
  const [jobs, setJobs] = useState<Job[]>([]);
  const outbox = useOutboxItems();
  const inputId = `photo-${itemKey}`;
  const busy = jobs.some((j) => j.stage !== 'failed');

  function update(id: string, change: Partial<Job> | null) {
    setJobs((all) =>
      change === null
        ? all.filter((j) => j.id !== id)
        : all.map((j) => (j.id === id ? { ...j, ...change } : j)),
    );
  }

  // without signal the photo waits, with its bytes, in the phone's outbox: it is sent before any
  // handoff queued after it, and the form already holds its id
  async function keep(job: Job, prepared: PreparedPhoto) {
    await addToOutbox({
      key: prepared.photoId,
      kind: 'photo',
      group: trailerId,
      url: '/api/uploads',
      body: prepared as unknown as Record<string, unknown>,
      meta: { itemKey },
    });
    update(job.id, null);
    onAdd({ id: prepared.photoId });
  }

  async function run(job: Job) {
    update(job.id, { stage: 'shrinking', percent: 0, error: undefined });
    let prepared = job.prepared;
    try {
      prepared ??= await preparePhoto(job.file, { photoId: job.id, trailerId, itemKey }, policy, (percent) =>
        update(job.id, { percent }),
      );
      update(job.id, { prepared });
      if (!navigator.onLine) return await keep(job, prepared);
      update(job.id, { stage: 'sending', percent: 30 });
      await sendPhoto(prepared, { announce: t('announceFailed'), refused: t('refused') }, (f) =>
        update(job.id, f < 1 ? { percent: 30 + Math.round(f * 60) } : { stage: 'checking', percent: 95 }),
      );
      update(job.id, null);
      onAdd({ id: prepared.photoId });
    } catch (err) {
      // the signal dropped on the way: kept on the phone like a photo taken offline
      if (prepared && !(err instanceof PhotoRefused))
        return void (await keep(job, prepared).catch(() => undefined));
      const error = err instanceof Error && err.message ? say(err.message) : t('failed');
      update(job.id, { stage: 'failed', error: navigator.onLine ? error : t('noSignal') });
    }
  }

  return (
    <div className="space-y-2">
      {photos.length ? (
        <ul className="flex flex-wrap gap-2" aria-label={t('photosOf', { label })}>
          {photos.map((p) => {
            const queued = outbox.find((i) => i.key === p.id && i.kind === 'photo');
            return (
              <li key={p.id}>
                {queued && queued.state !== 'sent' ? (
                  <span
                    role="img"
                    aria-label={t('photoOf', { label })}
                    className={`flex h-20 w-20 items-center justify-center rounded border-2 p-1 text-center text-gate-sm font-bold ${queued.state === 'pending' ? 'border-warn bg-warn-bg text-warn' : 'border-danger text-danger'}`}
                  >
                    {queued.state === 'pending' ? t('waiting') : t('refusedLater')}
                  </span>
                ) : (
                  /* eslint-disable-next-line @next/next/no-img-element -- served by the app, checked and sized at upload */
                  <img
                    src={`/api/photos/${p.id}`}
                    alt={t('photoOf', { label })}
                    className="h-20 w-20 rounded border-2 border-paper-line object-cover"
                  />
                )}
              </li>
            );
          })}
        </ul>
      ) : null}
      {jobs.length ? (
        <ul className="space-y-1" aria-label={t('uploadsOf', { label })}>
          {jobs.map((j, n) => (
            <li key={j.id} className="space-y-1 rounded-lg bg-paper-dim p-2 text-gate-sm">
              <div className="flex items-center justify-between gap-2">
                <span className="font-bold">
                  {t('photoNumber', { n: n + 1 })}: {t(`stage.${j.stage}`)}
                  {j.stage !== 'failed' ? ` ${j.percent}%` : ''}
                </span>
                {j.stage === 'failed' ? (
                  <button
                    type="button"
                    className="min-h-tap rounded-lg border-2 border-brand px-3 font-bold text-brand"
                    onClick={() => void run(j)}
                  >
                    {t('retry')}
                  </button>
                ) : null}
              </div>
              {j.stage === 'failed' ? (
                <p role="alert" className="font-bold text-danger">
                  {j.error}
                </p>
              ) : (
                <progress
                  className="h-2 w-full"
                  max={100}
                  value={j.percent}
                  aria-label={t('progressOf', { n: n + 1 })}
                />
              )}
            </li>
          ))}
        </ul>
      ) : null}
      <label
        htmlFor={inputId}
        className="inline-flex min-h-tap cursor-pointer items-center rounded-lg border-2 border-brand bg-paper px-4 text-gate font-bold text-brand"
      >
        {busy ? t('uploading') : photos.length ? t('addAnother') : t('take')}
      </label>
      <input
        id={inputId}
        type="file"
        accept="image/*"
        capture="environment"
        className="sr-only"
        aria-label={t('photoOf', { label })}
        onChange={(e) => {
          const file = e.target.files?.[0];
          e.target.value = '';
          if (!file) return;
          const job: Job = { id: crypto.randomUUID(), file, stage: 'shrinking', percent: 0 };
          setJobs((all) => [...all, job]);
          void run(job);
        }}
      />
    </div>
  );
}
