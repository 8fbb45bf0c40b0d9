'use client';

import { useTranslations } from 'next-intl';
import { useState } from 'react';
import { useRefusalText } from './use-refusal-text';

/** A photo that reached storage and passed the server's checks. */
export type CapturedPhoto = { id: string };

const MAX_SIDE = 1600;

async function resizeToJpeg(file: File): Promise<Blob> {
  const bitmap = await createImageBitmap(file);
  const scale = Math.min(1, MAX_SIDE / Math.max(bitmap.width, bitmap.height));
  const canvas = document.createElement('canvas');
  canvas.width = Math.max(1, Math.round(bitmap.width * scale));
  canvas.height = Math.max(1, Math.round(bitmap.height * scale));
  canvas.getContext('2d')!.drawImage(bitmap, 0, 0, canvas.width, canvas.height);
  bitmap.close();
  return new Promise((resolve, reject) =>
    canvas.toBlob((b) => (b ? resolve(b) : reject(new Error('resize failed'))), 'image/jpeg', 0.85),
  );
}

async function sha256Hex(bytes: ArrayBuffer): Promise<string> {
  const digest = await crypto.subtle.digest('SHA-256', bytes);
  return [...new Uint8Array(digest)].map((b) => b.toString(16).padStart(2, '0')).join('');
}

async function message(res: Response, fallback: string) {
  const body = await res.json().catch(() => null);
  return (body && typeof body.message === 'string' ? body.message : fallback) as string;
}

/** Camera photo → resized JPEG → SHA-256 → presigned PUT → server check. */
type Words = { notAnnounced: string; notUploaded: string; refused: string };

async function uploadPhoto(file: File, trailerId: string, itemKey: string, w: Words): Promise<CapturedPhoto> {
  const blob = await resizeToJpeg(file);
  const bytes = await blob.arrayBuffer();
  const announce = await fetch('/api/uploads', {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({
      trailerId,
      itemKey,
      contentType: 'image/jpeg',
      byteSize: bytes.byteLength,
      sha256: await sha256Hex(bytes),
    }),
  });
  if (!announce.ok) throw new Error(await message(announce, w.notAnnounced));
  const { photoId, uploadUrl, headers } = await announce.json();
  const put = await fetch(uploadUrl, { method: 'PUT', headers, body: blob });
  if (!put.ok) throw new Error(w.notUploaded);
  const done = await fetch(`/api/uploads/${photoId}/complete`, { method: 'POST' });
  if (!done.ok) throw new Error(await message(done, w.refused));
  return { id: photoId };
}

/** Takes a photo of one checklist item and uploads it; the gate form and the desk's dispute form use it. */
export function PhotoCapture({
  trailerId,
  itemKey,
  label,
  photos,
  onAdd,
}: {
  trailerId: string;
  itemKey: string;
  label: string;
  photos: CapturedPhoto[];
  onAdd: (p: CapturedPhoto) => void;
}) {
  const t = useTranslations('Common');
  const say = useRefusalText();
  const [state, setState] = useState<{ busy: boolean; error: string | null }>({ busy: false, error: null });
  const inputId = `photo-${itemKey}`;
  return (
    <div className="space-y-2">
      {photos.length ? (
        <ul className="flex flex-wrap gap-2" aria-label={t('photo.photosOf', { label })}>
          {photos.map((p) => (
            <li key={p.id}>
              {/* eslint-disable-next-line @next/next/no-img-element -- served by the app, checked and sized at upload */}
              <img
                src={`/api/photos/${p.id}`}
                alt={t('photo.photoOf', { label })}
                className="h-20 w-20 rounded border-2 border-paper-line object-cover"
              />
            </li>
          ))}
        </ul>
      ) : null}
      <label
        htmlFor={inputId}
        className="inline-flex min-h-tap cursor-pointer items-center rounded-lg border-2 border-brand bg-paper px-4 text-gate font-bold text-brand"
      >
        {state.busy ? t('photo.uploading') : photos.length ? t('photo.another') : t('photo.take')}
      </label>
      <input
        id={inputId}
        type="file"
        accept="image/*"
        capture="environment"
        className="sr-only"
        aria-label={t('photo.photoOf', { label })}
        disabled={state.busy}
        onChange={async (e) => {
          const file = e.target.files?.[0];
          e.target.value = '';
          if (!file) return;
          setState({ busy: true, error: null });
          try {
            onAdd(
              await uploadPhoto(file, trailerId, itemKey, {
                notAnnounced: t('photo.notAnnounced'),
                notUploaded: t('photo.notUploaded'),
                refused: t('photo.refused'),
              }),
            );
            setState({ busy: false, error: null });
          } catch (err) {
            setState({
              busy: false,
              error: err instanceof Error ? say(err.message) : t('photo.notSaved'),
            });
          }
        }}
      />
      <p aria-live="polite" className="text-gate-sm font-bold text-danger">
        {state.error ?? ''}
      </p>
    </div>
  );
}
