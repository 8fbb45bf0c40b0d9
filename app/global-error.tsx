'use client';

export default function GlobalError({
  error,
  reset,
}: {
  error: Error & { digest?: string };
  reset: () => void;
}) {
  return (
    <html lang="en">
      <body style={{ fontFamily: 'system-ui', padding: 24 }}>
        <h1>Hitchmark hit an unexpected problem</h1>
        <p>Nothing you entered was sent twice. Try again; if it keeps happening, tell the terminal office.</p>
        <button type="button" onClick={() => reset()} style={{ minHeight: 48, padding: '0 20px' }}>
          Try again
        </button>
        {error.digest ? <p>Reference for the office: {error.digest}</p> : null}
      </body>
    </html>
  );
}
