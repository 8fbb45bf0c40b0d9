/** The reference of a logged server error, for the terminal office to quote. */
export function ErrorDigest({ digest }: { digest?: string }) {
  if (!digest) return null;
  return <p className="mt-2 text-gate-sm text-ink-soft">Reference for the office: {digest}</p>;
}
