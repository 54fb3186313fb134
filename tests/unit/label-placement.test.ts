/**
 * The 3D preview's label placement (components/preview/label-placement.ts): with fixed
 * rectangles, no two visible labels overlap, every visible label lies inside the view, and when
 * labels compete the more important one stays. The layout rules (priority order, the side facing
 * the middle first) are drawing choices [common practice for chart labels], not engineering values.
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { placeLabels, rectsOverlap, type LabelRequest, type Rect } from "@/components/preview/label-placement";
import { sceneLabels } from "@/components/preview/scene-annotations";
import { defaultDesignInput, designInputSchema, sizeParsedDesign } from "@/engine";

const VIEW = { width: 480, height: 300 };

function visibleRects(labels: LabelRequest[], view = VIEW): Rect[] {
  return placeLabels(labels, view).filter((p) => p.visible).map((p) => p.rect!);
}

function expectNoOverlap(rects: Rect[]): void {
  for (let i = 0; i < rects.length; i++) for (let j = i + 1; j < rects.length; j++) {
    expect(rectsOverlap(rects[i], rects[j]), `labels ${i} and ${j} overlap: ${JSON.stringify([rects[i], rects[j]])}`).toBe(false);
  }
}

describe("rectsOverlap", () => {
  it("counts shared area, not touching edges", () => {
    expect(rectsOverlap({ x: 0, y: 0, width: 10, height: 10 }, { x: 5, y: 5, width: 10, height: 10 })).toBe(true);
    expect(rectsOverlap({ x: 0, y: 0, width: 10, height: 10 }, { x: 10, y: 0, width: 10, height: 10 })).toBe(false);
    expect(rectsOverlap({ x: 0, y: 0, width: 10, height: 10 }, { x: 0, y: 11, width: 10, height: 10 })).toBe(false);
  });
});

describe("placeLabels with fixed rectangles", () => {
  // Three labels whose anchors sit almost on one point, as the clearance, embedment and wind
  // labels did on a phone-width view of a small array.
  const crowded: LabelRequest[] = [
    { id: "wind", priority: 3, anchor: { x: 200, y: 150 }, width: 160, height: 18 },
    { id: "clearance", priority: 2, anchor: { x: 204, y: 154 }, width: 110, height: 18 },
    { id: "embedment", priority: 1, anchor: { x: 202, y: 158 }, width: 120, height: 18 },
  ];

  it("puts crowded labels in different spots around their anchors, none overlapping", () => {
    const placed = placeLabels(crowded, VIEW);
    const rects = placed.filter((p) => p.visible).map((p) => p.rect!);
    expect(rects.length).toBeGreaterThanOrEqual(2);
    expectNoOverlap(rects);
    // The two most important go to different sides of nearly the same point.
    const [, clearance, embedment] = placed;
    expect(embedment.visible && clearance.visible).toBe(true);
    expect(embedment.spot).not.toBe(clearance.spot);
  });

  it("keeps the most important label where labels cannot all fit, and hides the least important", () => {
    // A view too small for more than one label beside the anchor.
    const small = { width: 150, height: 40 };
    const labels: LabelRequest[] = crowded.map((l) => ({ ...l, anchor: { x: 20, y: 20 } }));
    const placed = placeLabels(labels, small);
    const byId = Object.fromEntries(placed.map((p) => [p.id, p]));
    expect(byId.embedment.visible).toBe(true);
    expect(byId.wind.visible).toBe(false);
    expectNoOverlap(placed.filter((p) => p.visible).map((p) => p.rect!));
  });

  it("answers in the order asked, whatever the priorities", () => {
    expect(placeLabels(crowded, VIEW).map((p) => p.id)).toEqual(["wind", "clearance", "embedment"]);
  });

  it("puts a label on the side facing the middle of the view first", () => {
    const [left] = placeLabels([{ id: "a", priority: 1, anchor: { x: 30, y: 100 }, width: 100, height: 16 }], VIEW);
    const [right] = placeLabels([{ id: "a", priority: 1, anchor: { x: 450, y: 100 }, width: 100, height: 16 }], VIEW);
    expect(left.spot).toBe("right");
    expect(right.spot).toBe("left");
  });

  it("centres a centred label on its anchor", () => {
    const [n] = placeLabels([{ id: "north", priority: 4, anchor: { x: 100, y: 100 }, width: 12, height: 18, fit: "center" }], VIEW);
    expect(n.rect).toEqual({ x: 94, y: 91, width: 12, height: 18 });
  });

  it("hides a label whose point is off screen or behind the camera", () => {
    const placed = placeLabels([
      { id: "behind", priority: 1, anchor: null, width: 50, height: 16 },
      { id: "off", priority: 2, anchor: { x: -40, y: 100 }, width: 50, height: 16 },
      { id: "below", priority: 3, anchor: { x: 100, y: 400 }, width: 50, height: 16 },
    ], VIEW);
    expect(placed.map((p) => p.visible)).toEqual([false, false, false]);
  });

  it("never places a label over the view's edge", () => {
    // Wider than the view: no spot fits, so it is hidden rather than cut off.
    const [wide] = placeLabels([{ id: "wide", priority: 1, anchor: { x: 240, y: 150 }, width: 600, height: 16 }], VIEW);
    expect(wide.visible).toBe(false);
  });

  it("never overlaps, for any set of labels in any view (property test)", () => {
    const label = fc.record({
      priority: fc.integer({ min: 1, max: 5 }),
      anchor: fc.option(fc.record({ x: fc.double({ min: -50, max: 500, noNaN: true }), y: fc.double({ min: -50, max: 350, noNaN: true }) }), { nil: null }),
      width: fc.double({ min: 4, max: 300, noNaN: true }),
      height: fc.double({ min: 4, max: 40, noNaN: true }),
      fit: fc.constantFrom<"side" | "center">("side", "center"),
    });
    fc.assert(fc.property(fc.array(label, { maxLength: 8 }), fc.integer({ min: 100, max: 1300 }), fc.integer({ min: 100, max: 600 }), (ls, width, height) => {
      const labels = ls.map((l, i) => ({ ...l, id: `l${i}` }));
      const placed = placeLabels(labels, { width, height });
      const rects = placed.filter((p) => p.visible).map((p) => p.rect!);
      for (const r of rects) {
        expect(r.x).toBeGreaterThanOrEqual(0);
        expect(r.y).toBeGreaterThanOrEqual(0);
        expect(r.x + r.width).toBeLessThanOrEqual(width);
        expect(r.y + r.height).toBeLessThanOrEqual(height);
      }
      expectNoOverlap(rects);
      // Nothing is hidden for nothing: the most important label, near the middle with room around it, is shown.
      const best = [...labels].sort((a, b) => a.priority - b.priority)[0];
      const a = best?.anchor;
      if (a && a.x >= width / 3 && a.x <= (2 * width) / 3 && a.y >= height / 3 && a.y <= (2 * height) / 3 && best.width < width / 3 - 10 && best.height < height / 3 - 10 && best.fit === "side") {
        expect(placed.find((p) => p.id === best.id)!.visible).toBe(true);
      }
    }), { numRuns: 300 });
  });
});

describe("the scene's labels", () => {
  const g = sizeParsedDesign(designInputSchema.parse(defaultDesignInput)).geometryPreview;
  const labels = sceneLabels(g, { clearance: "24 in", embedment: "60 in (5 ft 0 in)" }, 20, "Wind onto the face, case A");
  it("rank the embedment first, then clearance, wind and north", () => {
    expect([...labels].sort((a, b) => a.priority - b.priority).map((l) => l.id)).toEqual(["embedment", "clearance", "wind", "north"]);
  });
  it("carry the figures they are given", () => {
    expect(labels.find((l) => l.id === "embedment")!.text).toBe("Embedment 60 in (5 ft 0 in)");
    expect(labels.find((l) => l.id === "clearance")!.text).toBe("Clearance 24 in");
  });
});
