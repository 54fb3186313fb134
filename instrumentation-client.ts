import { z } from "zod";

/**
 * Runs in the browser before the app's own code (a Next.js file convention). zod compiles fast
 * parsers with `new Function` unless told not to, and merely probing for that is reported as a
 * violation of the content-security policy (proxy.ts allows no eval). The interpreted parsers are
 * quick enough for forms; the server keeps the compiled ones.
 */
z.config({ jitless: true });
