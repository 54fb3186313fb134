import { forbidden, notFound, redirect } from "next/navigation";
import { getAccessFallbackHTTPStatus, isHTTPAccessFallbackError } from "next/dist/client/components/http-access-fallback/http-access-fallback";
import { AccessRefused } from "@/components/ui/access-refused";
import { AccessError } from "./errors";

/**
 * The page response for an access failure: signed out → the sign-in page (coming back after),
 * another organisation's data → 404, a missing role → 403 with app/forbidden.tsx.
 */
export function accessInterrupt(error: AccessError, returnTo?: string): never {
  if (error.status === 401) redirect(returnTo ? `/login?next=${encodeURIComponent(returnTo)}` : "/login");
  if (error.status === 404) notFound();
  forbidden();
}

/** Runs a page's data loading and turns access failures into the page responses people expect. */
export async function forPage<T>(load: () => Promise<T>, returnTo?: string): Promise<T> {
  try {
    return await load();
  } catch (error) {
    if (error instanceof AccessError) accessInterrupt(error, returnTo);
    throw error;
  }
}

/**
 * A page whose 404 or 403 shows its words in the server HTML (components/ui/access-refused.tsx says
 * why a bare `notFound()` does not): the page's own `notFound()`/`forbidden()` (from `forPage`)
 * becomes `<AccessRefused>`, which interrupts the render with the same status. Sign-in redirects
 * and every other error pass through unchanged.
 */
// `any`: each page keeps its own signature (props, or none), which Next and the tests check.
export function refusable<F extends (...args: any[]) => Promise<unknown>>(page: F): F {
  return async function RefusablePage(...args: Parameters<F>) {
    try {
      return await page(...args);
    } catch (error) {
      if (isHTTPAccessFallbackError(error)) {
        const status = getAccessFallbackHTTPStatus(error);
        if (status === 404 || status === 403) return <AccessRefused status={status} />;
      }
      throw error;
    }
  } as F;
}
