/**
 * When two results draw the same scene. Most keystrokes in the editor give a new result whose
 * preview geometry is equal, or differs only in figures the scene shows as page text (a wind
 * force, a dimension's value): the 3D scene then keeps its parts and draws no frame. Compared field
 * by field with an early exit and no allocation (cheaper than serialising the geometry at every
 * keystroke). No React and no three.js here.
 */
import type { PreviewGeometry } from "@/engine/geometry/preview";

/**
 * Geometry fields no pixel of the 3D scene depends on, by the key of the object that holds them:
 * they reach the screen as text only (the caption, the labels over the canvas, the canvas's
 * accessible name), which the page draws without the scene. The wind's direction, load case and
 * centre of pressure and every dimension's end points are drawn, so they are compared.
 */
const TEXT_ONLY: Readonly<Record<string, readonly string[]>> = {
  wind: ["label", "normalForceLb"],
  clearance: ["valueIn"],
  embedment: ["valueIn"],
};

const NONE: readonly string[] = [];

function equal(a: unknown, b: unknown, key: string, skipTextOnly: boolean): boolean {
  if (a === b) return true;
  if (typeof a === "number" && typeof b === "number") return Number.isNaN(a) && Number.isNaN(b);
  if (typeof a !== "object" || typeof b !== "object" || a === null || b === null) return false;
  if (Array.isArray(a) || Array.isArray(b)) {
    if (!Array.isArray(a) || !Array.isArray(b) || a.length !== b.length) return false;
    // Array items belong to the array's key (a rail, a module), not to a key of their own.
    for (let i = 0; i < a.length; i++) if (!equal(a[i], b[i], key, skipTextOnly)) return false;
    return true;
  }
  const skip = skipTextOnly ? TEXT_ONLY[key] ?? NONE : NONE;
  const ra = a as Record<string, unknown>, rb = b as Record<string, unknown>;
  let count = 0;
  for (const k in ra) {
    count++;
    if (!(k in rb)) return false;
    if (!skip.includes(k) && !equal(ra[k], rb[k], k, skipTextOnly)) return false;
  }
  for (const k in rb) count--;
  return count === 0;
}

/** The same geometry, every field equal (what the caption and the 2D elevation show). */
export function sameGeometry(a: PreviewGeometry, b: PreviewGeometry): boolean {
  return equal(a, b, "", false);
}

/** The same 3D drawing: equal in every field the scene draws from (text-only figures aside). */
export function sameDrawing(a: PreviewGeometry, b: PreviewGeometry): boolean {
  return equal(a, b, "", true);
}
