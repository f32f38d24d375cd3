/**
 * The Content-Security-Policy of every page, with a fresh nonce per request: scripts run only
 * from the app itself and from tags carrying the nonce (Next.js adds it to its own), so an
 * injected inline script never runs. Styles allow inline `style` attributes, which React and the
 * D3 charts write; they cannot run code. Nothing may frame the app.
 */
export function contentSecurityPolicy(nonce: string, { development = false } = {}): string {
  return [
    "default-src 'self'",
    // 'strict-dynamic': scripts the nonce-bearing ones load (the app's chunks) are trusted too.
    `script-src 'self' 'nonce-${nonce}' 'strict-dynamic'${development ? " 'unsafe-eval'" : ''}`,
    "style-src 'self' 'unsafe-inline'",
    "img-src 'self' data: blob:",
    "font-src 'self' data:",
    "connect-src 'self'",
    "worker-src 'self' blob:",
    "object-src 'none'",
    "base-uri 'self'",
    "form-action 'self'",
    "frame-ancestors 'none'",
  ].join('; ');
}

/** Headers on every response; HSTS only when the app is served over https. */
export function commonSecurityHeaders(appUrl: string): Record<string, string> {
  return {
    'X-Content-Type-Options': 'nosniff',
    'Referrer-Policy': 'same-origin',
    'X-Frame-Options': 'DENY',
    'Permissions-Policy': 'camera=(), microphone=(), geolocation=(), payment=(), usb=(), interest-cohort=()',
    'Cross-Origin-Opener-Policy': 'same-origin',
    ...(appUrl.startsWith('https://') ? { 'Strict-Transport-Security': 'max-age=31536000; includeSubDomains' } : {}),
  };
}
