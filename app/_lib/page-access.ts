import { forbidden, notFound, redirect } from "next/navigation";
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
