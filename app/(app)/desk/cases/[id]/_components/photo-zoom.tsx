'use client';

import { useTranslations } from 'next-intl';
import { useRef, useState } from 'react';

/** A photo thumbnail that opens large on click; a placeholder when the photo cannot be loaded. */
export function PhotoZoom({ photoId, alt }: { photoId: string; alt: string }) {
  const t = useTranslations('Case');
  const dialog = useRef<HTMLDialogElement>(null);
  const [isBroken, setBroken] = useState(false);
  const src = `/api/photos/${photoId}`;
  if (isBroken) {
    return (
      <div
        role="img"
        aria-label={t('photo.unavailableLabel', { alt })}
        className="flex h-28 w-full items-center justify-center rounded-lg border-2 border-dashed border-paper-line bg-paper-dim p-2 text-center text-gate-sm text-ink-soft"
      >
        {t('photo.unavailable')}
      </div>
    );
  }
  return (
    <>
      <button
        type="button"
        onClick={() => dialog.current?.showModal()}
        className="block w-full rounded-lg border-2 border-paper-line focus:outline-4 focus:outline-brand"
        aria-label={t('photo.open', { alt })}
      >
        {/* eslint-disable-next-line @next/next/no-img-element -- photos stream from our own API, sized by the browser */}
        <img
          src={src}
          alt={alt}
          loading="lazy"
          onError={() => setBroken(true)}
          className="h-28 w-full rounded-md object-cover"
        />
      </button>
      <dialog
        ref={dialog}
        className="m-auto max-h-[95vh] max-w-[95vw] rounded-xl bg-black p-2 backdrop:bg-black/80"
        aria-label={alt}
        onClick={() => dialog.current?.close()}
      >
        {/* eslint-disable-next-line @next/next/no-img-element -- same photo at full size */}
        <img src={src} alt={alt} className="max-h-[85vh] max-w-full object-contain" />
        <button
          type="button"
          className="mt-2 min-h-tap w-full rounded-lg bg-paper text-gate font-bold"
          onClick={() => dialog.current?.close()}
        >
          {t('photo.close')}
        </button>
      </dialog>
    </>
  );
}
