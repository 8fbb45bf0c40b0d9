'use client';

import { useTranslations } from 'next-intl';
import { useCameraScan } from '@/app/_components/scanner/use-camera-scan';

const PROBLEMS = ['denied', 'no_camera', 'failed'] as const;

/** Reads one code with the camera (label QR or VIN barcode) and hands over the raw text. */
export function CameraButton({ label, onText }: { label: string; onText: (text: string) => void }) {
  const { videoRef, camera, start, stop } = useCameraScan(onText);
  const t = useTranslations('Yard');
  const isLive = camera === 'starting' || camera === 'scanning';
  return (
    <div className="space-y-1">
      <video
        ref={videoRef}
        muted
        playsInline
        aria-label={t('camera.view')}
        className={isLive ? 'aspect-[4/3] w-full rounded-xl bg-black object-cover' : 'hidden'}
      />
      <button
        type="button"
        onClick={() => (isLive ? stop() : void start())}
        className="min-h-tap w-full rounded-lg border-2 border-brand bg-paper px-4 text-gate font-bold text-brand"
      >
        {isLive ? t('camera.stop') : label}
      </button>
      {(PROBLEMS as readonly string[]).includes(camera) ? (
        <p role="alert" className="text-gate-sm font-bold text-danger">
          {t(`camera.${camera as (typeof PROBLEMS)[number]}`)}
        </p>
      ) : null}
    </div>
  );
}
