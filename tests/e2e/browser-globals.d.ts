// What browser tests find on a page's window: Next's client runtime once hydrated, the CSP watch's exposed
// binding (security-headers, dev-csp) and axe-core once its source is evaluated (axe.ts).
import type axe from "axe-core";

declare global {
  interface Window {
    next?: unknown;
    __cspViolation: (v: unknown) => void;
    axe: typeof axe;
  }
}
