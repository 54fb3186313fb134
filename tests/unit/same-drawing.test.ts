/**
 * When the 3D preview keeps its drawing (components/preview/same-drawing.ts): a result whose
 * geometry differs only in figures the scene shows as page text (the wind's force and label, a
 * dimension's value) draws no new frame; a change to anything drawn does. The geometries are the
 * engine's own (engine/geometry/preview.ts) for the demo input at several wind speeds; which fields
 * are drawn is read from components/preview (scene-mapping.ts, scene-annotations.ts,
 * camera-framing.ts), not from a published standard.
 */
import { describe, expect, it } from "vitest";
import { defaultDesignInput, designInputSchema, sizeParsedDesign } from "@/engine";
import type { PreviewGeometry } from "@/engine/geometry/preview";
import { sameDrawing, sameGeometry } from "@/components/preview/same-drawing";

const at = (windSpeedMph: number): PreviewGeometry =>
  sizeParsedDesign(designInputSchema.parse({ ...defaultDesignInput, site: { ...defaultDesignInput.site, windSpeedMph } })).geometryPreview;

/** Paths of the fields the scene shows only as text (the caption, the labels over the canvas). */
const TEXT_ONLY = new Set(["wind.label", "wind.normalForceLb", "dimensions.clearance.valueIn", "dimensions.embedment.valueIn"]);

/** Every leaf of the geometry as [path without array indices, setter to a changed value]. */
function leaves(g: unknown, path: string[] = [], out: { path: string; change: (copy: unknown) => void }[] = [], keys: (string | number)[] = []) {
  if (g !== null && typeof g === "object") {
    for (const [k, v] of Object.entries(g)) leaves(v, Array.isArray(g) ? path : [...path, k], out, [...keys, Array.isArray(g) ? Number(k) : k]);
    return out;
  }
  out.push({
    path: path.join("."),
    change: (copy) => {
      let o = copy as Record<string | number, unknown>;
      for (const k of keys.slice(0, -1)) o = o[k] as Record<string | number, unknown>;
      const last = keys.at(-1)!;
      const v = o[last];
      o[last] = typeof v === "number" ? v + 0.5 : typeof v === "boolean" ? !v : `${String(v)} changed`;
    },
  });
  return out;
}

describe("the 3D scene keeps its drawing when only text figures change", () => {
  const base = at(115);

  it("treats a copy as the same geometry and the same drawing", () => {
    const copy = structuredClone(base);
    expect(sameGeometry(base, copy)).toBe(true);
    expect(sameDrawing(base, copy)).toBe(true);
  });

  it("keeps the drawing from 115 to 116 mph (same footing, larger wind force) and redraws at 130 mph (deeper footing)", () => {
    const near = at(116);
    // Preconditions from the engine: the force differs, the footing does not.
    expect(near.wind?.normalForceLb).not.toBe(base.wind?.normalForceLb);
    expect(near.footings.map((f) => [f.diameterFt, f.depthFt])).toEqual(base.footings.map((f) => [f.diameterFt, f.depthFt]));
    expect(sameGeometry(base, near)).toBe(false);
    expect(sameDrawing(base, near)).toBe(true);

    const far = at(130);
    expect(far.footings[0].depthFt).not.toBe(base.footings[0].depthFt);
    expect(sameDrawing(base, far)).toBe(false);
  });

  it("redraws for a change to any drawn field, and only for those", () => {
    const all = leaves(base);
    expect(all.length).toBeGreaterThan(100);
    for (const leaf of all) {
      const copy = structuredClone(base);
      leaf.change(copy);
      expect(sameGeometry(base, copy), leaf.path).toBe(false);
      expect(sameDrawing(base, copy), leaf.path).toBe(TEXT_ONLY.has(leaf.path));
    }
    // Every text-only field is in the demo geometry, so each was tried above.
    expect(new Set(all.map((l) => l.path).filter((p) => TEXT_ONLY.has(p)))).toEqual(TEXT_ONLY);
  });

  it("redraws when a part is added or removed", () => {
    const fewer = structuredClone(base);
    fewer.rails.pop();
    expect(sameDrawing(base, fewer)).toBe(false);
    const noWind = { ...structuredClone(base), wind: null };
    expect(sameDrawing(base, noWind)).toBe(false);
  });
});
