'use client';

import { useTranslations } from 'next-intl';
import { useState } from 'react';
import { FieldError, Textarea } from '@/app/_components/field';
import { useFieldError } from '@/app/_components/form-state';
import { PhotoCapture } from '@/app/_components/photo-capture';

/** The dispute's note and optional photos; the photo ids travel in one hidden field. */
export function DisputeFields({ trailerId, itemKey }: { trailerId: string; itemKey: string }) {
  const t = useTranslations('Case');
  const [photos, setPhotos] = useState<{ id: string }[]>([]);
  const photoErrors = useFieldError('photoIds');
  return (
    <>
      <Textarea
        label={t('actions.disputeNote')}
        name="note"
        id="dispute-note"
        required
        minLength={10}
        rows={4}
      />
      <input type="hidden" name="photoIds" value={photos.map((p) => p.id).join(',')} />
      <PhotoCapture
        trailerId={trailerId}
        itemKey={itemKey}
        label={t('actions.disputeEvidence')}
        photos={photos}
        onAdd={(p) => setPhotos((list) => [...list, p])}
      />
      <FieldError id="photoIds-error" messages={photoErrors} />
    </>
  );
}
