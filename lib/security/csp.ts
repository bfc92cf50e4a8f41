// The Content-Security-Policy of every page (OWASP ASVS 4.0 §14.4.3), set per request by proxy.ts with a fresh
// nonce. Next.js reads the nonce from the policy on the request and puts it on its own scripts; 'strict-dynamic'
// lets those scripts load the app's chunks, and nothing else runs (no inline handlers, no injected <script>).
// Styles allow 'unsafe-inline': React, the charts and the drag layer set style attributes, and e-mails shown
// in the mailbox carry inline styles; a style cannot run code. `next dev` also needs eval (React's dev tools
// and fast refresh) and its websocket, so those two are added in development only.

/** A 128-bit random nonce, base64 (CSP3 §2.3.1 nonce-source). */
export function newNonce(): string {
  const bytes = crypto.getRandomValues(new Uint8Array(16));
  return btoa(String.fromCharCode(...bytes));
}

export function contentSecurityPolicy({ nonce, dev }: { nonce: string; dev: boolean }): string {
  const directives: Record<string, string[]> = {
    "default-src": ["'self'"],
    "script-src": ["'self'", `'nonce-${nonce}'`, "'strict-dynamic'", ...(dev ? ["'unsafe-eval'"] : [])],
    "style-src": ["'self'", "'unsafe-inline'"],
    "img-src": ["'self'", "data:", "blob:"],
    "font-src": ["'self'", "data:"],
    "connect-src": ["'self'", ...(dev ? ["ws:", "wss:"] : [])],
    "object-src": ["'none'"],
    "base-uri": ["'none'"],
    "form-action": ["'self'"],
    "frame-ancestors": ["'none'"],
  };
  return Object.entries(directives)
    .map(([name, values]) => `${name} ${values.join(" ")}`)
    .join("; ");
}
