/**
 * The browser's zod configuration (components/ui/browser-zod-config.tsx) is set without importing
 * zod, through the global object zod reads its configuration from. This checks that zod reads it
 * (whichever loads first), and that the server (no `window`) is left with compiled parsers.
 */
import { afterEach, describe, expect, it, vi } from "vitest";

const g = globalThis as { window?: unknown; __zod_globalConfig?: Record<string, unknown> };

describe("zod's configuration in the browser", () => {
  afterEach(() => {
    delete g.window;
    if (g.__zod_globalConfig) delete g.__zod_globalConfig.jitless;
    vi.resetModules();
  });

  it("turns zod's compiled parsers off when the module runs in a browser, before or after zod loads", async () => {
    g.window = {};
    await import("@/components/ui/browser-zod-config");
    const { z } = await import("zod");
    expect(z.config().jitless).toBe(true);
    vi.resetModules();
    delete g.__zod_globalConfig!.jitless;
    const again = await import("zod");
    await import("@/components/ui/browser-zod-config");
    expect(again.z.config().jitless).toBe(true);
  });

  it("leaves the server's parsers compiled", async () => {
    delete g.window;
    await import("@/components/ui/browser-zod-config");
    const { z } = await import("zod");
    expect(z.config().jitless).not.toBe(true);
  });
});

describe("pages that never validate in the browser", () => {
  it("do not download zod for its configuration: the root layout's module does not import it", async () => {
    const fs = await import("node:fs");
    const source = fs.readFileSync(new URL("../../components/ui/browser-zod-config.tsx", import.meta.url), "utf8");
    expect(source).not.toMatch(/from\s+["']zod/);
    expect(source).not.toMatch(/import\(\s*["']zod/);
  });
});
