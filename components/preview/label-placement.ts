/**
 * Where the 3D preview's labels go on screen. Pure: no three.js, no DOM, so it is tested with
 * fixed rectangles.
 *
 * Labels are placed one at a time in priority order (most important first). Each tries a few
 * spots around its anchor point (the side facing the middle of the view first, so a label at the
 * edge of a narrow phone view does not run off the canvas) and takes the first one that lies inside
 * the view and clear of every label already placed. A label with no free spot, or whose anchor is
 * off screen or behind the camera, is hidden: the figures it carries are also in the caption
 * under the preview, so hiding one loses nothing, while two labels drawn over each other can be
 * misread (one label's number read as the other's).
 */

export interface Rect { x: number; y: number; width: number; height: number }

export interface LabelRequest {
  id: string;
  /** Lower is more important: placed first, hidden last. */
  priority: number;
  /** The point the label describes, in px from the view's top-left; null when it is behind the camera. */
  anchor: { x: number; y: number } | null;
  width: number;
  height: number;
  /** "center" centres the label on its anchor (the north letter); "side" puts it beside the anchor. */
  fit?: "side" | "center";
}

export type LabelSpot = "right" | "left" | "above" | "below" | "center";

export interface LabelPlacement { id: string; visible: boolean; spot: LabelSpot | null; rect: Rect | null }

export interface PlacementOptions {
  /** Space between the anchor and the label, px. */
  gap?: number;
  /** Space kept free around every placed label, px (so two labels never touch either). */
  padding?: number;
  /** Space kept free inside the view's edges, px. */
  margin?: number;
}

/** True when the two rectangles share any area (touching edges do not count). */
export function rectsOverlap(a: Rect, b: Rect): boolean {
  return a.x < b.x + b.width && b.x < a.x + a.width && a.y < b.y + b.height && b.y < a.y + a.height;
}

const grow = (r: Rect, by: number): Rect => ({ x: r.x - by, y: r.y - by, width: r.width + 2 * by, height: r.height + 2 * by });

function candidates(l: LabelRequest, view: { width: number; height: number }, gap: number): [LabelSpot, Rect][] {
  const { x, y } = l.anchor!;
  const { width: w, height: h } = l;
  if (l.fit === "center") return [["center", { x: x - w / 2, y: y - h / 2, width: w, height: h }]];
  const right: [LabelSpot, Rect] = ["right", { x: x + gap, y: y - h / 2, width: w, height: h }];
  const left: [LabelSpot, Rect] = ["left", { x: x - gap - w, y: y - h / 2, width: w, height: h }];
  const above: [LabelSpot, Rect] = ["above", { x: x - w / 2, y: y - gap - h, width: w, height: h }];
  const below: [LabelSpot, Rect] = ["below", { x: x - w / 2, y: y + gap, width: w, height: h }];
  return x < view.width / 2 ? [right, left, above, below] : [left, right, above, below];
}

/**
 * Places `labels` in a view of `view` px. Every visible label's rectangle lies inside the view
 * (less the margin) and no two visible rectangles, each grown by the padding, overlap.
 */
export function placeLabels(labels: readonly LabelRequest[], view: { width: number; height: number }, options: PlacementOptions = {}): LabelPlacement[] {
  const gap = options.gap ?? 8;
  const padding = options.padding ?? 2;
  const margin = options.margin ?? 2;
  const placed: Rect[] = [];
  const byId = new Map<string, LabelPlacement>();
  const order = labels.map((l, i) => ({ l, i })).sort((a, b) => a.l.priority - b.l.priority || a.i - b.i);
  for (const { l } of order) {
    let chosen: LabelPlacement = { id: l.id, visible: false, spot: null, rect: null };
    const onScreen = l.anchor && Number.isFinite(l.anchor.x) && Number.isFinite(l.anchor.y)
      && l.anchor.x >= 0 && l.anchor.x <= view.width && l.anchor.y >= 0 && l.anchor.y <= view.height;
    if (onScreen && l.width > 0 && l.height > 0) {
      for (const [spot, rect] of candidates(l, view, gap)) {
        const inside = rect.x >= margin && rect.y >= margin && rect.x + rect.width <= view.width - margin && rect.y + rect.height <= view.height - margin;
        if (!inside) continue;
        const padded = grow(rect, padding);
        if (placed.some((p) => rectsOverlap(padded, p))) continue;
        chosen = { id: l.id, visible: true, spot, rect };
        placed.push(padded);
        break;
      }
    }
    byId.set(l.id, chosen);
  }
  return labels.map((l) => byId.get(l.id)!);
}
