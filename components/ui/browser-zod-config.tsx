"use client";

import { z } from "zod";

/*
 * zod compiles fast parsers with `new Function` unless told not to, and merely probing for that is
 * reported as a violation of the content-security policy (proxy.ts allows no eval). This module is
 * part of the root layout's client code, so it runs in the browser before any form or the editor
 * parses anything; the interpreted parsers are quick enough there. The server keeps the compiled ones.
 */
z.config({ jitless: true });

/** Rendered once by the root layout only so that this module loads in every page. */
export function BrowserZodConfig(): null {
  return null;
}
