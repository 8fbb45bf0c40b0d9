'use client';

import { useCallback, useEffect, useRef, useState } from 'react';
import type { IScannerControls } from '@zxing/browser';

export type CameraState = 'idle' | 'starting' | 'scanning' | 'denied' | 'no_camera' | 'insecure' | 'failed';

function cameraErrorState(error: unknown): CameraState {
  const name = error instanceof Error || error instanceof DOMException ? error.name : '';
  if (name === 'NotAllowedError' || name === 'SecurityError') return 'denied';
  if (name === 'NotFoundError' || name === 'OverconstrainedError' || name === 'DevicesNotFoundError')
    return 'no_camera';
  return 'failed';
}

/**
 * Runs the rear camera (facingMode 'environment' as a preference, never `exact`) through
 * @zxing/browser, loaded with import() only when scanning starts, and hands over the first
 * decoded text (QR or Code 39). The camera stops after one read.
 */
export function useCameraScan(onDecoded: (text: string) => void) {
  const videoRef = useRef<HTMLVideoElement>(null);
  const controlsRef = useRef<IScannerControls | null>(null);
  const onDecodedRef = useRef(onDecoded);
  // false once stopped or unmounted, so a camera that finishes starting afterwards is stopped at once
  const wantsCameraRef = useRef(false);
  const [camera, setCamera] = useState<CameraState>('idle');

  useEffect(() => {
    onDecodedRef.current = onDecoded;
  }, [onDecoded]);

  const stop = useCallback(() => {
    wantsCameraRef.current = false;
    controlsRef.current?.stop();
    controlsRef.current = null;
    setCamera((c) => (c === 'scanning' || c === 'starting' ? 'idle' : c));
  }, []);

  const start = useCallback(async () => {
    if (!videoRef.current) return;
    if (!window.isSecureContext) return setCamera('insecure');
    if (!navigator.mediaDevices?.getUserMedia) return setCamera('no_camera');
    wantsCameraRef.current = true;
    setCamera('starting');
    try {
      const [{ BrowserMultiFormatReader }, { BarcodeFormat, DecodeHintType }] = await Promise.all([
        import('@zxing/browser'),
        import('@zxing/library'),
      ]);
      const hints = new Map<unknown, unknown>([
        [DecodeHintType.POSSIBLE_FORMATS, [BarcodeFormat.QR_CODE, BarcodeFormat.CODE_39]],
      ]);
      if (!wantsCameraRef.current || !videoRef.current) return;
      const reader = new BrowserMultiFormatReader(hints as never, { delayBetweenScanAttempts: 100 });
      let isDone = false;
      const controls = await reader.decodeFromVideoDevice(
        undefined,
        videoRef.current,
        (result, _error, controls) => {
          if (!result || isDone) return;
          isDone = true;
          wantsCameraRef.current = false;
          controls.stop();
          controlsRef.current = null;
          setCamera('idle');
          onDecodedRef.current(result.getText());
        },
      );
      if (!wantsCameraRef.current) return controls.stop();
      if (!isDone) {
        controlsRef.current = controls;
        setCamera('scanning');
      }
    } catch (error) {
      controlsRef.current = null;
      setCamera(cameraErrorState(error));
    }
  }, []);

  useEffect(
    () => () => {
      wantsCameraRef.current = false;
      controlsRef.current?.stop();
    },
    [],
  );

  return { videoRef, camera, start, stop };
}
