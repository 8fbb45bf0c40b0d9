'use client';

import { useState } from 'react';
// the gate's camera-to-storage upload (resize, SHA-256, presigned PUT, server check), reused as is
import { PhotoCapture } from '@/app/_components/photo-capture';
import { inputClass } from './action-form';

/** The dispute's note and optional photos; the photo ids travel in one hidden field. */
export function DisputeFields({ trailerId, itemKey }: { trailerId: string; itemKey: string }) {
  const [photos, setPhotos] = useState<{ id: string }[]>([]);
  return (
    <>
      <label className="block text-gate font-bold">
        Why is this damage not yours?
        <textarea name="note" required minLength={10} rows={4} className={`${inputClass} py-2`} />
      </label>
      <input type="hidden" name="photoIds" value={photos.map((p) => p.id).join(',')} />
      <PhotoCapture
        trailerId={trailerId}
        itemKey={itemKey}
        label="your evidence"
        photos={photos}
        onAdd={(p) => setPhotos((list) => [...list, p])}
      />
    </>
  );
}
