// The response headers that guard every page, file and route handler (OWASP ASVS 4.0 V14.4,
// OWASP Secure Headers Project). next.config.ts sets the fixed ones for every path; proxy.ts sets
// the Content-Security-Policy with a fresh nonce per request, and HSTS when served over HTTPS.

/** Fixed headers, the same on every response. */
export const FIXED_HEADERS: { key: string; value: string }[] = [
  // Clickjacking: no page may be framed (also `frame-ancestors 'none'` in the CSP).
  { key: "X-Frame-Options", value: "DENY" },
  { key: "X-Content-Type-Options", value: "nosniff" },
  { key: "Referrer-Policy", value: "strict-origin-when-cross-origin" },
  { key: "Permissions-Policy", value: permissionsPolicy(false) },
];

/** The intake desk scans QR labels with the device camera; nothing else uses it. */
export function permissionsPolicy(camera: boolean): string {
  return [
    `camera=(${camera ? "self" : ""})`,
    "microphone=()",
    "geolocation=()",
    "payment=()",
    "usb=()",
    "browsing-topics=()",
  ].join(", ");
}

type CspOptions = {
  nonce: string;
  /** React's development build needs eval for its error overlays (Next.js CSP guide). */
  dev: boolean;
  /** The photo store the browser uploads to with a presigned form POST. */
  storageOrigin: string;
  https: boolean;
};

/**
 * A strict nonce-based policy (Next.js "Content Security Policy" guide; CSP Level 3): scripts only
 * with this response's nonce and what they load ('strict-dynamic'); styles from our own files and
 * Next's nonced tags, plus style attributes (React `style` props; they cannot run script).
 */
export function contentSecurityPolicy({ nonce, dev, storageOrigin, https }: CspOptions): string {
  const directives = [
    "default-src 'self'",
    `script-src 'self' 'nonce-${nonce}' 'strict-dynamic'${dev ? " 'unsafe-eval'" : ""}`,
    // Development injects style tags without a nonce for hot reloading.
    `style-src 'self' ${dev ? "'unsafe-inline'" : `'nonce-${nonce}'`}`,
    "style-src-attr 'unsafe-inline'",
    "img-src 'self' blob: data:",
    "font-src 'self'",
    `connect-src 'self' ${storageOrigin}`,
    // Stated apart from script-src: 'strict-dynamic' would otherwise keep the service worker out.
    "worker-src 'self'",
    "manifest-src 'self'",
    "object-src 'none'",
    "base-uri 'self'",
    "form-action 'self'",
    "frame-ancestors 'none'",
  ];
  if (https) directives.push("upgrade-insecure-requests");
  return directives.join("; ");
}

/** HSTS for two years, subdomains included (OWASP HTTP Strict Transport Security Cheat Sheet). */
export const HSTS = "max-age=63072000; includeSubDomains";
