"use client";

import { forbidden, notFound, useServerInsertedHTML } from "next/navigation";
import { RefusalText, type RefusalStatus } from "./refusal-text";

/**
 * A page's 404 or 403 (app/_lib/page-access.ts `refusable`), with its words in the server HTML.
 *
 * Why not just `notFound()` in the page: Next.js (16.4) answers a `notFound()`/`forbidden()` thrown
 * while a page renders on the server with its error shell — the right status, but
 * `<html id="__next_error__">` with an empty body — and only the browser then renders
 * app/not-found.tsx from the page data. The page was blank until scripts ran, and blank for good
 * without them. Here the same interrupt is thrown while the server renders this component (so Next
 * still sets 404/403), after handing Next the refusal's words as server-inserted HTML, which it
 * writes into that shell. The browser then throws the same interrupt and shows app/not-found.tsx
 * (or app/forbidden.tsx) with the same words in place of these.
 */
export function AccessRefused({ status }: { status: RefusalStatus }): never {
  let written = false;
  useServerInsertedHTML(() => {
    if (written) return null; // Next asks at every flush: the words go in once.
    written = true;
    return <RefusalText status={status} plain />;
  });
  if (status === 404) notFound();
  forbidden();
}
