'use client';

import { useTranslations } from 'next-intl';
import { useCallback, useState } from 'react';
import { Button } from '@/app/_components/button';
import { useRefusalText } from '@/app/_components/use-refusal-text';
import { classifyScan } from '@/lib/labels/scan-text';
import { lookupTrailer, type LookupQuery, type ScannedTrailer } from './lookup';
import { ScanProblem } from './scan-problem';
import { TypedLookup } from './typed-lookup';
import { useCameraScan } from './use-camera-scan';

export type { ScannedTrailer };

/**
 * Finds a trailer by its Hitchmark label (QR), its VIN barcode (Code 39) or a typed unit number/VIN.
 *
 * Props:
 * - `onTrailer(trailer)`: called once a scan or typed entry is looked up and found.
 * - `onText(text)`: optional; raw decoded text that is neither a label link nor a VIN (say, a slot
 *   label). Return true when handled; otherwise the scanner shows it as an unknown code.
 * - `startLabel`: the start button's words (default "Scan trailer label").
 * The camera code (@zxing/browser) is loaded only when the start button is pressed.
 */
export function TrailerScanner({
  onTrailer,
  onText,
  startLabel,
}: {
  onTrailer: (trailer: ScannedTrailer) => void;
  onText?: (text: string) => boolean;
  startLabel?: string;
}) {
  const t = useTranslations('Common');
  const say = useRefusalText();
  const [problem, setProblem] = useState<{ message: string; read?: string } | null>(null);
  const [isBusy, setBusy] = useState(false);

  const find = useCallback(
    async (query: LookupQuery, read?: string) => {
      setBusy(true);
      setProblem(null);
      const result = await lookupTrailer(query);
      setBusy(false);
      if (result.ok) onTrailer(result.trailer);
      else
        setProblem({
          message:
            result.status === 0
              ? t('scanner.noConnection')
              : result.status === 401
                ? t('scanner.sessionEnded')
                : say(result.message),
          read,
        });
    },
    [onTrailer, t, say],
  );

  const onDecoded = useCallback(
    (text: string) => {
      const code = classifyScan(text);
      if (code.kind === 'token') return void find({ token: code.token }, text);
      if (code.kind === 'vin') return void find({ vin: code.vin }, text);
      if (onText?.(text)) return;
      setProblem({ message: t('scanner.notOurs'), read: code.text });
    },
    [find, onText, t],
  );

  const { videoRef, camera, start, stop } = useCameraScan(onDecoded);
  const isLive = camera === 'starting' || camera === 'scanning';

  return (
    <div className="space-y-4">
      <div className="space-y-2">
        <video
          ref={videoRef}
          muted
          playsInline
          aria-label={t('scanner.cameraView')}
          className={isLive ? 'aspect-[4/3] w-full rounded-xl bg-black object-cover' : 'hidden'}
        />
        {isLive ? (
          <>
            <p role="status" className="text-gate font-bold">
              {camera === 'starting' ? t('scanner.starting') : t('scanner.point')}
            </p>
            <Button type="button" variant="secondary" className="w-full" onClick={stop}>
              {t('scanner.stop')}
            </Button>
          </>
        ) : (
          <Button
            type="button"
            className="min-h-tap-lg w-full text-gate-lg"
            onClick={() => {
              setProblem(null);
              void start();
            }}
            disabled={isBusy}
          >
            {startLabel ?? t('scanner.start')}
          </Button>
        )}
        {isBusy ? (
          <p role="status" className="text-gate font-bold">
            {t('scanner.lookingUp')}
          </p>
        ) : null}
        <ScanProblem camera={camera} problem={problem} />
      </div>
      <TypedLookup onLookup={(q) => void find(q)} isBusy={isBusy} />
    </div>
  );
}
