import type { Browser, BrowserContext } from "playwright-core";
import { afterAll, beforeAll } from "vitest";
import { db } from "@/db/client";
import { launch } from "./browser";

/**
 * One browser for a test file: launched before its tests, closed after them with every context the
 * file kept, and the file's database connections released. Replaces the same dozen lines at the top
 * of each browser test.
 */
export function browserSuite(options: Parameters<typeof launch>[0] = {}) {
  let browser: Browser | undefined;
  const contexts: BrowserContext[] = [];
  beforeAll(async () => {
    browser = await launch(options);
  });
  afterAll(async () => {
    for (const c of contexts) await c.close();
    await browser?.close();
    await db.destroy();
  });
  return {
    get browser(): Browser {
      if (!browser) throw new Error("the browser starts in beforeAll: use it inside a test");
      return browser;
    },
    /** Closes the context with the browser at the end of the file. */
    keep<T extends BrowserContext>(context: T): T {
      contexts.push(context);
      return context;
    },
  };
}
