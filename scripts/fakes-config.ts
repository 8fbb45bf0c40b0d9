// Ports and names of the local fakes (S3-compatible storage, SMTP inbox), from scripts/env.sh.
// The app reads its own S3_* and SMTP_* settings (lib/server/env.ts); these are only the fakes'.
export const fakes = {
  s3Port: Number(process.env.HM_S3_PORT ?? 4569),
  smtpPort: Number(process.env.HM_SMTP_PORT ?? 2525),
  mailHttpPort: Number(process.env.HM_MAIL_HTTP_PORT ?? 2580),
  bucket: process.env.S3_BUCKET ?? 'hitchmark-photos',
  /** Where the S3 fake keeps objects (default .data/s3); tests give a folder of their own. */
  s3Dir: process.env.HM_S3_DIR as string | undefined,
};
