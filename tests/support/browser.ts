import fs from "node:fs";
import { chromium, type Browser, type BrowserContext, type Page } from "playwright-core";

/** Debian's Chromium, headless, with the flags that keep it off the network and give it software WebGL. */
export const CHROMIUM_ARGS = [
  "--no-sandbox",
  "--disable-gpu",
  "--disable-quic",
  "--no-first-run",
  "--disable-background-networking",
  "--disable-component-update",
  "--disable-sync",
  "--use-angle=swiftshader",
  "--enable-unsafe-swiftshader",
];

export const DESKTOP = { width: 1280, height: 900 };
export const PHONE = { width: 390, height: 844 };

export function baseUrl(): string {
  const url = process.env.E2E_BASE_URL;
  if (!url) throw new Error("E2E_BASE_URL is not set: run browser tests through `npm test -- e2e`.");
  return url;
}

export async function launch(options: { webgl?: boolean } = {}): Promise<Browser> {
  const args = options.webgl === false ? [...CHROMIUM_ARGS.filter((a) => !a.includes("swiftshader")), "--disable-webgl", "--disable-3d-apis"] : CHROMIUM_ARGS;
  return chromium.launch({ executablePath: "/usr/bin/chromium", headless: true, args });
}

/** A browser context signed in as a demo person through the real sign-in API. */
export async function signedInContext(browser: Browser, email: string, viewport = DESKTOP): Promise<BrowserContext> {
  const context = await browser.newContext({ viewport, baseURL: baseUrl() });
  const response = await context.request.post("/api/session", { data: { email, password: "pierwise-demo" } });
  if (!response.ok()) throw new Error(`sign-in as ${email} failed: ${response.status()} ${await response.text()}`);
  return context;
}

/**
 * Saves a full-page screenshot to /tmp/shots/<name>.png when SCREENSHOTS=1 (for reading by eye);
 * SCREENSHOTS_DIR=<folder> puts them elsewhere (several people's runs at once).
 */
export async function shot(page: Page, name: string): Promise<void> {
  if (process.env.SCREENSHOTS !== "1") return;
  const dir = process.env.SCREENSHOTS_DIR || "/tmp/shots";
  fs.mkdirSync(dir, { recursive: true });
  await page.screenshot({ path: `${dir}/${name}.png`, fullPage: true });
}
