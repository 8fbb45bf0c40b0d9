'use client';

import { useCameraScan } from '@/app/_components/scanner/use-camera-scan';

const PROBLEMS = {
  denied: 'The camera is blocked: allow it in the browser, or type instead.',
  no_camera: 'No camera found: type instead.',
  failed: 'The camera did not start: type instead.',
} as const;

/** Reads one code with the camera (label QR or VIN barcode) and hands over the raw text. */
export function CameraButton({ label, onText }: { label: string; onText: (text: string) => void }) {
  const { videoRef, camera, start, stop } = useCameraScan(onText);
  const isLive = camera === 'starting' || camera === 'scanning';
  return (
    <div className="space-y-1">
      <video
        ref={videoRef}
        muted
        playsInline
        aria-label="Camera view"
        className={isLive ? 'aspect-[4/3] w-full rounded-xl bg-black object-cover' : 'hidden'}
      />
      <button
        type="button"
        onClick={() => (isLive ? stop() : void start())}
        className="min-h-tap w-full rounded-lg border-2 border-brand bg-paper px-4 text-gate font-bold text-brand"
      >
        {isLive ? 'Stop camera' : label}
      </button>
      {camera in PROBLEMS ? (
        <p role="alert" className="text-gate-sm font-bold text-danger">
          {PROBLEMS[camera as keyof typeof PROBLEMS]}
        </p>
      ) : null}
    </div>
  );
}
