import { useTranslations } from 'next-intl';
import type { CameraState } from './use-camera-scan';

const CAMERA_HELP = ['denied', 'no_camera', 'insecure', 'failed'] as const;
type HelpState = (typeof CAMERA_HELP)[number];
const needsHelp = (camera: CameraState): camera is HelpState =>
  (CAMERA_HELP as readonly string[]).includes(camera);

/** The way forward after a camera or code problem; always points to the typed entry. */
export function ScanProblem({
  camera,
  problem,
}: {
  camera: CameraState;
  problem: { message: string; read?: string } | null;
}) {
  const t = useTranslations('Common');
  const help = needsHelp(camera)
    ? { title: t(`scanner.camera.${camera}.title`), text: t(`scanner.camera.${camera}.text`) }
    : null;
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
            <p className="mt-1 break-all font-mono text-gate-sm">
              {t('scanner.read', { text: problem.read })}
            </p>
          ) : null}
          <p className="mt-1">{t('scanner.again')}</p>
        </>
      ) : null}
    </div>
  );
}
