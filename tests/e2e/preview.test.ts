/**
 * The 3D preview in the design editor, in Debian's Chromium: software WebGL draws the scene and
 * a tilt edit redraws it; with WebGL switched off the 2D side elevation shows the same clearance and
 * embedment figures. Navigates by the demo seed's invented project and design names.
 */
import type { Browser, Locator, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { PROBE_CANVAS_ATTRIBUTE } from "@/components/preview/webgl-support";
import { DESKTOP, PHONE, launch, shot, signedInContext } from "../support/browser";

const DESIGNER = "designer@demo.pierwise.test";
// The scene's clear colour (components/preview/scene-style.ts COLOURS.background).
const BACKGROUND = [0xee, 0xf2, 0xf6];

async function openDemoDesign(browser: Browser, viewport = DESKTOP): Promise<Page> {
  const context = await signedInContext(browser, DESIGNER, viewport);
  const page = await context.newPage();
  // Earlier suites add many projects to the demo organisation: find the demo one by name.
  await page.goto("/projects?q=Larkspur");
  await page.getByRole("link", { name: "Larkspur Meadow residence (demo)" }).click();
  await page.getByRole("link", { name: "Alternative on four posts" }).click();
  await page.getByTestId("design-preview").waitFor({ timeout: 30_000 });
  return page;
}

/** Decodes a PNG of the canvas in the page (a 2D canvas works without WebGL) and returns its pixels. */
async function canvasPixels(page: Page, canvas: Locator): Promise<number[]> {
  const png = (await canvas.screenshot()).toString("base64");
  return page.evaluate(async (b64) => {
    const img = new Image();
    img.src = `data:image/png;base64,${b64}`;
    await img.decode();
    const c = document.createElement("canvas");
    c.width = img.width;
    c.height = img.height;
    const ctx = c.getContext("2d")!;
    ctx.drawImage(img, 0, 0);
    return Array.from(ctx.getImageData(0, 0, c.width, c.height).data);
  }, png);
}

function drawnFraction(rgba: number[]): number {
  let drawn = 0;
  for (let i = 0; i < rgba.length; i += 4) {
    const d = Math.abs(rgba[i] - BACKGROUND[0]) + Math.abs(rgba[i + 1] - BACKGROUND[1]) + Math.abs(rgba[i + 2] - BACKGROUND[2]);
    if (d > 30) drawn++;
  }
  return drawn / (rgba.length / 4);
}

function changedFraction(a: number[], b: number[]): number {
  if (a.length !== b.length) return 1;
  let changed = 0;
  for (let i = 0; i < a.length; i += 4) {
    if (Math.abs(a[i] - b[i]) + Math.abs(a[i + 1] - b[i + 1]) + Math.abs(a[i + 2] - b[i + 2]) > 30) changed++;
  }
  return changed / (a.length / 4);
}

/**
 * The scene's labels (page text over the canvas) that are shown, with their boxes on screen. Waits
 * until the first frame has placed at least one.
 */
async function shownLabels(preview: Locator): Promise<{ id: string; text: string; box: { x: number; y: number; width: number; height: number } }[]> {
  const read = () => preview.locator("[data-preview-label]").evaluateAll((els) => els
    .filter((el) => getComputedStyle(el).visibility === "visible")
    .map((el) => {
      const r = el.getBoundingClientRect();
      return { id: el.getAttribute("data-preview-label") ?? "", text: el.textContent ?? "", box: { x: r.x, y: r.y, width: r.width, height: r.height } };
    }));
  return eventually(read, (ls) => ls.length > 0);
}

/** No two shown labels share any area, and each lies inside the canvas. */
async function expectLabelsApart(preview: Locator): Promise<string[]> {
  const labels = await shownLabels(preview);
  const canvas = (await preview.locator("canvas").boundingBox())!;
  for (const l of labels) {
    expect(l.box.x).toBeGreaterThanOrEqual(canvas.x - 0.5);
    expect(l.box.y).toBeGreaterThanOrEqual(canvas.y - 0.5);
    expect(l.box.x + l.box.width).toBeLessThanOrEqual(canvas.x + canvas.width + 0.5);
    expect(l.box.y + l.box.height).toBeLessThanOrEqual(canvas.y + canvas.height + 0.5);
  }
  for (let i = 0; i < labels.length; i++) for (let j = i + 1; j < labels.length; j++) {
    const a = labels[i].box, b = labels[j].box;
    const overlap = a.x < b.x + b.width && b.x < a.x + a.width && a.y < b.y + b.height && b.y < a.y + a.height;
    expect(overlap, `"${labels[i].text}" overlaps "${labels[j].text}"`).toBe(false);
  }
  return labels.map((l) => l.id);
}

/** The preview alone, for reading by eye (SCREENSHOTS=1; SCREENSHOTS_DIR as for `shot`). */
async function elementShot(element: Locator, name: string): Promise<void> {
  if (process.env.SCREENSHOTS === "1") await element.screenshot({ path: `${process.env.SCREENSHOTS_DIR || "/tmp/shots"}/${name}.png` });
}

/** Polls until `check` passes: software WebGL and the font take a moment. */
async function eventually<T>(read: () => Promise<T>, ok: (v: T) => boolean, timeoutMs = 30_000): Promise<T> {
  const until = Date.now() + timeoutMs;
  let value = await read();
  while (!ok(value) && Date.now() < until) {
    await new Promise((r) => setTimeout(r, 500));
    value = await read();
  }
  return value;
}

describe("3D preview in the design editor (software WebGL)", () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launch();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it("draws the scene, and redraws it when the tilt changes", async () => {
    const page = await openDemoDesign(browser);
    const preview = page.getByTestId("design-preview");
    const canvas = preview.locator("canvas");
    await canvas.waitFor({ timeout: 30_000 });
    expect(await preview.getByTestId("preview-fallback").count()).toBe(0);

    const before = await eventually(() => canvasPixels(page, canvas), (px) => drawnFraction(px) > 0.03);
    // The array, ground and footings cover well over 3 % of the canvas at the framed home view.
    expect(drawnFraction(before)).toBeGreaterThan(0.03);
    await shot(page, "preview-editor-desktop");
    await elementShot(preview, "preview-element-desktop");
    // The embedment (what the crew digs) is always labelled; no two labels overlap.
    expect(await expectLabelsApart(preview)).toContain("embedment");

    const tilt = page.getByLabel("Tilt", { exact: true });
    expect(await tilt.inputValue()).toBe("30");
    await tilt.fill("10");
    await tilt.blur();
    await page.locator('[role="img"][aria-label^="3D preview at 10° tilt"]').waitFor({ timeout: 30_000 });
    const after = await eventually(() => canvasPixels(page, canvas), (px) => changedFraction(before, px) > 0.01);
    expect(changedFraction(before, after)).toBeGreaterThan(0.01);
    expect(drawnFraction(after)).toBeGreaterThan(0.03);

    await preview.getByRole("button", { name: "Side" }).click();
    const side = await eventually(() => canvasPixels(page, canvas), (px) => changedFraction(after, px) > 0.01);
    expect(changedFraction(after, side)).toBeGreaterThan(0.01);
    await shot(page, "preview-editor-side");
    await expectLabelsApart(preview);
    await page.context().close();
  });

  it("draws no frame for a new result whose drawing is the same or for other units, and one for a result whose drawing changed", async () => {
    const context = await signedInContext(browser, DESIGNER);
    // Counts the draw calls on the page's own canvases (a frame of the scene is a batch of them).
    await context.addInitScript(() => {
      const w = window as unknown as { __draws: number };
      w.__draws = 0;
      for (const C of [WebGLRenderingContext, WebGL2RenderingContext]) {
        for (const name of ["drawElements", "drawArrays", "drawElementsInstanced", "drawArraysInstanced"] as const) {
          const proto = C.prototype as unknown as Record<string, (...a: unknown[]) => unknown>;
          const f = proto[name];
          if (!f) continue;
          proto[name] = function (this: WebGLRenderingContext, ...a: unknown[]) {
            if (this.canvas instanceof HTMLCanvasElement && this.canvas.isConnected) w.__draws += 1;
            return f.apply(this, a);
          };
        }
      }
    });
    const page = await context.newPage();
    await page.goto("/projects?q=Larkspur");
    await page.getByRole("link", { name: "Larkspur Meadow residence (demo)" }).click();
    await page.getByRole("link", { name: "Alternative on four posts" }).click();
    const preview = page.getByTestId("design-preview");
    await shownLabels(preview);
    const draws = () => page.evaluate(() => (window as unknown as { __draws: number }).__draws);
    // Settled: no frame pending (the count holds still over a second).
    const settled = await eventually(async () => {
      const a = await draws();
      await page.waitForTimeout(1000);
      return [a, await draws()];
    }, ([a, b]) => a === b && a > 0);
    expect(settled[0]).toBeGreaterThan(0);

    // One mph more: a larger wind force in the caption, the same footing and dimensions (checked
    // here, so the step is known not to change what is drawn).
    const wind = page.getByLabel("Basic wind speed");
    const mph = Number(await wind.inputValue());
    const spec = page.getByTestId("footing-spec");
    const scene = preview.locator('[role="img"]');
    const before = { spec: await spec.textContent(), caption: await preview.locator("figcaption").textContent(), name: await scene.getAttribute("aria-label") };
    const drawsBefore = await draws();
    await wind.fill(String(mph + 1));
    await eventually(() => preview.locator("figcaption").textContent(), (c) => c !== before.caption);
    await page.waitForTimeout(1500);
    expect(await preview.locator("figcaption").textContent()).not.toBe(before.caption);
    expect(await spec.textContent()).toBe(before.spec);
    expect(await scene.getAttribute("aria-label")).toBe(before.name);
    expect(await draws()).toBe(drawsBefore);
    expect(await expectLabelsApart(preview)).toContain("embedment");

    // A deeper footing is a new drawing: it is drawn.
    await wind.fill(String(mph + 60));
    await eventually(() => spec.textContent(), (t) => t !== before.spec);
    expect(await eventually(draws, (n) => n > drawsBefore)).toBeGreaterThan(drawsBefore);

    // Metric units: new label text over the same drawing, placed without drawing a frame.
    const drawn = await eventually(async () => {
      const a = await draws();
      await page.waitForTimeout(1000);
      return [a, await draws()];
    }, ([a, b]) => a === b);
    const embedmentLabel = preview.locator('[data-preview-label="embedment"]');
    await page.getByRole("radio", { name: "Metric (m, mm, kN)" }).click();
    expect(await eventually(() => embedmentLabel.textContent(), (t) => / mm/.test(t ?? ""))).toMatch(/^Embedment .* mm/);
    await page.waitForTimeout(1000);
    expect(await draws()).toBe(drawn[1]);
    expect(await expectLabelsApart(preview)).toContain("embedment");
    await context.close();
  });

  it("stays within its column on a phone and draws there too", async () => {
    const page = await openDemoDesign(browser, PHONE);
    const preview = page.getByTestId("design-preview");
    const canvas = preview.locator("canvas");
    await canvas.waitFor({ timeout: 30_000 });
    const px = await eventually(() => canvasPixels(page, canvas), (p) => drawnFraction(p) > 0.03);
    await shot(page, "preview-editor-phone");
    await elementShot(preview, "preview-element-phone");
    expect(drawnFraction(px)).toBeGreaterThan(0.03);
    expect(await expectLabelsApart(preview)).toContain("embedment");
    for (const view of ["Front", "Side", "Top"]) {
      await preview.getByRole("button", { name: view }).click();
      await page.waitForTimeout(600);
      await expectLabelsApart(preview);
    }
    // The preview is as wide as the column the host gives it, never wider.
    const own = (await preview.boundingBox())!;
    const host = (await preview.locator("xpath=..").boundingBox())!;
    expect(own.width).toBeLessThanOrEqual(host.width + 1);
    expect((await canvas.boundingBox())!.width).toBeLessThanOrEqual(own.width);

    // Turned to landscape: the canvas follows its box (the root is configured again) and draws at the new size.
    await page.setViewportSize({ width: 700, height: 844 });
    const box = preview.locator('[role="img"]');
    const wider = await eventually(async () => [(await box.boundingBox())!.width, (await canvas.boundingBox())!.width], ([b, c]) => b > own.width + 100 && Math.abs(b - c) <= 1);
    expect(wider[0]).toBeGreaterThan(own.width + 100);
    expect(Math.abs(wider[0] - wider[1])).toBeLessThanOrEqual(1);
    expect(drawnFraction(await eventually(() => canvasPixels(page, canvas), (p) => drawnFraction(p) > 0.03))).toBeGreaterThan(0.03);
    expect(await expectLabelsApart(preview)).toContain("embedment");
    await page.context().close();
  });
});

describe("2D fallback when the 3D scene cannot start", () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launch();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it("catches a renderer that fails after the up-front check passed, and shows the elevation", async () => {
    const context = await signedInContext(browser, DESIGNER);
    // Only the up-front probe's own (marked) canvas gets a WebGL context; every other canvas is
    // refused, as when a browser runs out of contexts or the GPU process dies. The simulation does
    // not depend on how many contexts the probe or the scene ask for, nor in which order.
    await context.addInitScript((probeAttribute: string) => {
      const w = window as unknown as { __webglProbes: number };
      w.__webglProbes = 0;
      const probed = new WeakSet<HTMLCanvasElement>();
      const original = HTMLCanvasElement.prototype.getContext;
      HTMLCanvasElement.prototype.getContext = function (this: HTMLCanvasElement, type: string, ...rest: unknown[]) {
        if (/webgl/i.test(type)) {
          if (!this.hasAttribute(probeAttribute)) return null;
          if (!probed.has(this)) {
            probed.add(this);
            w.__webglProbes += 1;
          }
        }
        return (original as (...a: unknown[]) => RenderingContext | null).call(this, type, ...rest);
      } as typeof HTMLCanvasElement.prototype.getContext;
    }, PROBE_CANVAS_ATTRIBUTE);
    const page = await context.newPage();
    // Earlier suites add many projects to the demo organisation: find the demo one by name.
    await page.goto("/projects?q=Larkspur");
    await page.getByRole("link", { name: "Larkspur Meadow residence (demo)" }).click();
    await page.getByRole("link", { name: "Alternative on four posts" }).click();
    const fallback = page.getByTestId("design-preview").getByTestId("preview-fallback");
    await fallback.waitFor({ timeout: 30_000 });
    expect(await fallback.textContent()).toMatch(/could not start/);
    // The camera buttons go with the scene; nothing is left that does nothing.
    expect(await page.getByTestId("design-preview").getByRole("button", { name: "Side" }).count()).toBe(0);
    expect(await fallback.locator("svg").textContent()).toMatch(/Clearance \d+ in.*Embedment \d+ in/s);

    // Another design in the same page (client-side navigation, no reload) mounts a new preview:
    // it reuses the page's probe answer instead of asking the browser again.
    await page.evaluate(() => Object.assign(window, { __sameDocument: true }));
    await page.goBack();
    await page.getByRole("link", { name: "12-module array on two posts" }).click();
    await page.getByRole("heading", { level: 1, name: "12-module array on two posts" }).waitFor({ timeout: 30_000 });
    await fallback.waitFor({ timeout: 30_000 });
    expect(await fallback.textContent()).toMatch(/could not start/);
    const seen = await page.evaluate(() => {
      const w = window as unknown as { __webglProbes: number; __sameDocument?: boolean };
      return { probes: w.__webglProbes, sameDocument: w.__sameDocument === true };
    });
    expect(seen.sameDocument).toBe(true);
    expect(seen.probes).toBe(1);
    await context.close();
  });
});

describe("2D fallback without WebGL", () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launch({ webgl: false });
  });
  afterAll(async () => {
    await browser?.close();
  });

  it("shows a side elevation with the same clearance and embedment figures", async () => {
    const page = await openDemoDesign(browser);
    const preview = page.getByTestId("design-preview");
    const fallback = preview.getByTestId("preview-fallback");
    await fallback.waitFor({ timeout: 30_000 });
    expect(await preview.locator("canvas").count()).toBe(0);
    expect(await fallback.textContent()).toMatch(/WebGL/);

    const caption = (await preview.locator("figcaption").textContent()) ?? "";
    const clearance = caption.match(/Lowest-edge clearance\s*(.+?)\s*·/)?.[1];
    const embedment = caption.match(/Embedment\s*(.+?)\s*\(post/)?.[1];
    expect(clearance).toMatch(/^\d+ in/);
    expect(embedment).toMatch(/^\d+ in/);
    const svgText = (await fallback.locator("svg").textContent()) ?? "";
    expect(svgText).toContain(`Clearance ${clearance}`);
    expect(svgText).toContain(`Embedment ${embedment}`);
    await shot(page, "preview-fallback-desktop");
    await elementShot(preview, "preview-element-fallback");
    await page.context().close();
  });
});
