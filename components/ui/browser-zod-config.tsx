"use client";

/*
 * zod compiles fast parsers with `new Function` unless told not to, and merely probing for that is
 * reported as a violation of the content-security policy (proxy.ts allows no eval). This module is
 * part of the root layout's client code, so it runs in the browser before any form or the editor
 * parses anything; the interpreted parsers are quick enough there.
 *
 * It sets zod's global configuration, which zod keeps on `globalThis.__zod_globalConfig` (whichever
 * of the two loads first creates it), without importing zod: pages that never validate in the
 * browser then do not download zod at all (tests/unit/browser-zod-config.test.ts checks that zod
 * still reads it). Only in the browser: server-side rendering runs this module too, and the
 * server, which shares `globalThis` with the API routes, keeps the compiled parsers.
 */
if (typeof window !== "undefined") {
  const g = globalThis as { __zod_globalConfig?: Record<string, unknown> };
  g.__zod_globalConfig = Object.assign(g.__zod_globalConfig ?? {}, { jitless: true });
}

/** Rendered once by the root layout only so that this module loads in every page. */
export function BrowserZodConfig(): null {
  return null;
}
