'use client';

import { useTranslations } from 'next-intl';
import { useState } from 'react';
import { useRefusalText } from './use-refusal-text';
import { isSaneCaptureTime, readCaptureTime } from '@/lib/photos/capture-time';
import type { PhotoPolicy } from '@/lib/photos/policy';
import { usePhotoPolicy } from './photo-policy';

/** A photo that reached storage and passed the server's checks. */
export type CapturedPhoto = { id: string };

type Stage = 'shrinking' | 'sending' | 'checking' | 'failed';
type Job = { id: string; file: File; stage: Stage; percent: number; error?: string };

async function sha256Hex(bytes: ArrayBuffer): Promise<string> {
  const digest = await crypto.subtle.digest('SHA-256', bytes);
  return [...new Uint8Array(digest)].map((b) => b.toString(16).padStart(2, '0')).join('');
}

async function message(res: Response, fallback: string) {
  const body = await res.json().catch(() => null);
  return (body && typeof body.message === 'string' ? body.message : fallback) as string;
}

/** The presigned PUT, through XMLHttpRequest: fetch cannot report upload progress. */
function put(url: string, headers: Record<string, string>, body: Blob, onProgress: (f: number) => void) {
  return new Promise<void>((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open('PUT', url);
    for (const [k, v] of Object.entries(headers)) xhr.setRequestHeader(k, v);
    xhr.upload.onprogress = (e) => e.lengthComputable && onProgress(e.loaded / e.total);
    xhr.onload = () => (xhr.status < 300 ? resolve() : reject(new Error(`upload ${xhr.status}`)));
    xhr.onerror = () => reject(new Error('network'));
    xhr.ontimeout = () => reject(new Error('timeout'));
    xhr.timeout = 120_000;
    xhr.send(body);
  });
}

/**
 * Camera photo → capture time from its EXIF (before shrinking strips it) → shrunk on the phone
 * to the terminal's longest side and quality → SHA-256 → presigned PUT with progress → server check.
 */
async function uploadPhoto(
  file: File,
  trailerId: string,
  itemKey: string,
  policy: PhotoPolicy,
  progress: (stage: Stage, percent: number) => void,
  words: { announce: string; put: string; refused: string },
): Promise<CapturedPhoto> {
  const now = new Date();
  const taken = await readCaptureTime(file, -now.getTimezoneOffset());
  const capturedAt = taken && isSaneCaptureTime(taken, now) ? taken.toISOString() : null;
  progress('shrinking', 0);
  // loaded with the first photo, not with the page (the handoff form's first-load budget)
  const { default: imageCompression } = await import('browser-image-compression');
  const small = await imageCompression(file, {
    maxWidthOrHeight: policy.longestSidePx,
    initialQuality: policy.quality,
    fileType: 'image/jpeg',
    // the worker build loads the library from a CDN: not on a phone without signal, not under our CSP
    useWebWorker: false,
    onProgress: (p) => progress('shrinking', Math.round(p * 0.3)),
  });
  const contentType = small.type || 'image/jpeg';
  const bytes = await small.arrayBuffer();
  progress('sending', 30);
  const announce = await fetch('/api/uploads', {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({
      trailerId,
      itemKey,
      contentType,
      byteSize: bytes.byteLength,
      sha256: await sha256Hex(bytes),
    }),
  });
  if (!announce.ok) throw new Error(await message(announce, words.announce));
  const { photoId, uploadUrl, headers } = await announce.json();
  await put(uploadUrl, headers, new Blob([bytes], { type: contentType }), (f) =>
    progress('sending', 30 + Math.round(f * 60)),
  ).catch(() => {
    throw new Error(words.put);
  });
  progress('checking', 95);
  const done = await fetch(`/api/uploads/${photoId}/complete`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ capturedAt }),
  });
  if (!done.ok) throw new Error(await message(done, words.refused));
  return { id: photoId };
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
  const inputId = `photo-${itemKey}`;
  const busy = jobs.some((j) => j.stage !== 'failed');

  function update(id: string, change: Partial<Job> | null) {
    setJobs((all) =>
      change === null
        ? all.filter((j) => j.id !== id)
        : all.map((j) => (j.id === id ? { ...j, ...change } : j)),
    );
  }

  async function run(job: Job) {
    update(job.id, { stage: 'shrinking', percent: 0, error: undefined });
    try {
      const photo = await uploadPhoto(
        job.file,
        trailerId,
        itemKey,
        policy,
        (stage, percent) => update(job.id, { stage, percent }),
        { announce: t('announceFailed'), put: t('putFailed'), refused: t('refused') },
      );
      update(job.id, null);
      onAdd(photo);
    } catch (err) {
      const error = err instanceof Error && err.message ? say(err.message) : t('failed');
      update(job.id, { stage: 'failed', error: navigator.onLine ? error : t('noSignal') });
    }
  }

  return (
    <div className="space-y-2">
      {photos.length ? (
        <ul className="flex flex-wrap gap-2" aria-label={t('photosOf', { label })}>
          {photos.map((p) => (
            <li key={p.id}>
              {/* eslint-disable-next-line @next/next/no-img-element -- served by the app, checked and sized at upload */}
              <img
                src={`/api/photos/${p.id}`}
                alt={t('photoOf', { label })}
                className="h-20 w-20 rounded border-2 border-paper-line object-cover"
              />
            </li>
          ))}
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
