// The security headers of every page and API answer (proxy.ts sets them per request, with a fresh
// nonce). Pure, so a test can read the policy without a server. See docs/security.md.

export type HeaderOptions = {
  nonce: string;
  production: boolean;
  /** Where the browser PUTs photos (presigned URLs): the storage's public origin, if not this site. */
  uploadOrigin?: string | null;
};

/**
 * Content-Security-Policy: scripts only from this site with this response's nonce (the framework
 * puts the nonce on its own script tags; 'strict-dynamic' lets them load their chunks); no eval
 * outside development; no plugins; no framing by any site; forms post only here.
 * Styles allow inline attributes: React's style props and the font loader's tags set them, and
 * a style cannot run code.
 */
export function contentSecurityPolicy({ nonce, production, uploadOrigin }: HeaderOptions): string {
  const connect = ["'self'", uploadOrigin].filter(Boolean).join(' ');
  return [
    `default-src 'self'`,
    `script-src 'self' 'nonce-${nonce}' 'strict-dynamic'${production ? '' : " 'unsafe-eval'"}`,
    `style-src 'self' 'unsafe-inline'`,
    `img-src 'self' blob: data:`,
    `font-src 'self'`,
    `connect-src ${connect}`,
    `media-src 'self' blob: mediastream:`,
    `worker-src 'self'`,
    `manifest-src 'self'`,
    `object-src 'none'`,
    `base-uri 'self'`,
    `form-action 'self'`,
    `frame-ancestors 'none'`,
  ].join('; ');
}

/** Every header the proxy sets on a response. */
export function securityHeaders(o: HeaderOptions): Record<string, string> {
  return {
    'content-security-policy': contentSecurityPolicy(o),
    'referrer-policy': 'same-origin',
    'x-content-type-options': 'nosniff',
    'x-frame-options': 'DENY',
    // the camera for this site only (gate photos, label and yard scans); nothing else
    'permissions-policy': 'camera=(self), microphone=(), geolocation=(), payment=(), usb=()',
    ...(o.production ? { 'strict-transport-security': 'max-age=63072000; includeSubDomains' } : {}),
  };
}
