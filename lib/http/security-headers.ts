/** Headers that are the same for every response (set in next.config.ts at build time). */
export function securityHeaders(): { key: string; value: string }[] {
  return [
    { key: "X-Content-Type-Options", value: "nosniff" },
    { key: "X-Frame-Options", value: "DENY" },
    { key: "Referrer-Policy", value: "same-origin" },
    { key: "Permissions-Policy", value: "camera=(), microphone=(), geolocation=()" },
  ];
}

/**
 * The Content-Security-Policy of one response. Scripts run only with this response's nonce (Next
 * puts it on its own script tags when it finds it in the request's CSP header) and what those load
 * ('strict-dynamic'); no inline script without it. The dev server also needs eval for hot reload.
 * Styles keep 'unsafe-inline': React and the canvas set style attributes.
 */
export function contentSecurityPolicy(nonce: string, dev = process.env.NODE_ENV !== "production"): string {
  return [
    "default-src 'self'",
    `script-src 'self' 'nonce-${nonce}' 'strict-dynamic'${dev ? " 'unsafe-eval'" : ""}`,
    "style-src 'self' 'unsafe-inline'",
    "img-src 'self' data: blob:",
    "font-src 'self'",
    "connect-src 'self'",
    "object-src 'none'",
    "base-uri 'self'",
    "form-action 'self'",
    "frame-ancestors 'none'",
  ].join("; ");
}

/** Behind HTTPS (COOKIE_SECURE=1) browsers are told to use nothing else for two years. */
export function strictTransportSecurity(env: NodeJS.ProcessEnv = process.env): string | null {
  return env.COOKIE_SECURE === "1" ? "max-age=63072000; includeSubDomains" : null;
}
