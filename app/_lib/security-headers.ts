/**
 * The security headers every answer carries, built in one place so proxy.ts stays small and the
 * policy can be read (and tested) as a whole.
 *
 * Pages get a content-security policy with a fresh nonce per request: Next.js reads the nonce from
 * the request's policy header and puts it on its own scripts, so no inline script runs without it
 * ('unsafe-inline' is never allowed for scripts; 'strict-dynamic' lets those scripts load the
 * app's chunks). Styles keep 'unsafe-inline' because React style attributes and the font loader
 * use them. The 3D preview needs neither eval nor WebAssembly; its text is laid out on the main
 * thread (components/preview sets that up), so no blob: workers are needed either.
 */
export interface SecurityContext {
  nonce: string;
  pathname: string;
  https: boolean;
  development: boolean;
}

export function contentSecurityPolicy({ nonce, development }: Pick<SecurityContext, "nonce" | "development">): string {
  return [
    "default-src 'self'",
    // React's development build reconstructs server stacks with eval; the production build does not.
    `script-src 'self' 'nonce-${nonce}' 'strict-dynamic'${development ? " 'unsafe-eval'" : ""}`,
    "style-src 'self' 'unsafe-inline'",
    "img-src 'self' data: blob:",
    "font-src 'self' data:",
    "connect-src 'self'",
    "worker-src 'self'",
    "object-src 'none'",
    "base-uri 'none'",
    "form-action 'self'",
    "frame-ancestors 'none'",
  ].join("; ");
}

/**
 * Pages that carry a secret in their URL (the e-mailed single-use links, and the approval check's
 * code, the only key to that public page): their address must never travel as a Referer, not even
 * to the app's own scripts and logs. tests/app/security-headers.test.ts finds every page route
 * with a dynamic segment that is not a record id and fails when one is missing here.
 */
export const TOKEN_PAGE = /^\/(reset|invite|signup|engagements|verify)\/[^/]+\/?$/;

export function securityHeaders(ctx: SecurityContext): Record<string, string> {
  const headers: Record<string, string> = {
    "x-content-type-options": "nosniff",
    "x-frame-options": "DENY",
    "referrer-policy": TOKEN_PAGE.test(ctx.pathname) ? "no-referrer" : "same-origin",
    "permissions-policy": "camera=(), microphone=(), geolocation=(), payment=(), usb=(), interest-cohort=()",
    "cross-origin-opener-policy": "same-origin",
  };
  // API answers set their own policy where they serve files (a sandbox); pages get the nonce policy.
  if (!ctx.pathname.startsWith("/api/")) headers["content-security-policy"] = contentSecurityPolicy(ctx);
  // HSTS only over https (the app's URL, or a trusted proxy's X-Forwarded-Proto: servedOverHttps);
  // a header from anyone else never turns it on.
  if (ctx.https) headers["strict-transport-security"] = "max-age=31536000; includeSubDomains";
  return headers;
}
