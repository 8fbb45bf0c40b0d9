import type { CameraState } from './use-camera-scan';

const CAMERA_HELP: Partial<Record<CameraState, { title: string; text: string }>> = {
  denied: {
    title: 'Camera not allowed',
    text: 'Hitchmark may not use the camera. Allow the camera for this site in the browser settings and press the scan button again, or type the unit number below.',
  },
  no_camera: {
    title: 'No camera found',
    text: 'This device has no camera Hitchmark can use. Type the unit number or VIN below.',
  },
  insecure: {
    title: 'Camera needs a secure connection',
    text: 'Browsers allow the camera only on https addresses. Open Hitchmark by its https address, or type the unit number below.',
  },
  failed: {
    title: 'The camera did not start',
    text: 'Another app may be using it. Close it and press the scan button again, or type the unit number below.',
  },
};

/** The way forward after a camera or code problem; always points to the typed entry. */
export function ScanProblem({
  camera,
  problem,
}: {
  camera: CameraState;
  problem: { message: string; read?: string } | null;
}) {
  const help = CAMERA_HELP[camera];
  if (!help && !problem) return <div aria-live="polite" />;
  return (
    <div
      aria-live="polite"
      role="alert"
      className="rounded-lg border-2 border-danger bg-danger-bg p-3 text-gate text-ink"
    >
      {help ? (
        <>
          <p className="font-bold">{help.title}</p>
          <p>{help.text}</p>
        </>
      ) : null}
      {problem ? (
        <>
          <p className="font-bold">{problem.message}</p>
          {problem.read ? (
            <p className="mt-1 break-all font-mono text-gate-sm">Read: {problem.read}</p>
          ) : null}
          <p className="mt-1">Scan again, or type the unit number below.</p>
        </>
      ) : null}
    </div>
  );
}
