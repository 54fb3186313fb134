"use client";
import type { RefObject } from "react";
import { Vector3, type Camera } from "three";
import { placeLabels, type LabelRequest } from "./label-placement";
import type { SceneLabel } from "./scene-annotations";
import { COLOURS } from "./scene-style";

/**
 * The scene's labels are page text laid over the canvas, not text drawn in WebGL: they use the
 * page's own font (already loaded, so the first frame waits for no font and builds no glyph
 * textures), cost no shader program, and are placed in screen space so they never overlap
 * (label-placement.ts). The canvas carries the same figures in its accessible name and the
 * caption under the preview shows them all, so the layer is hidden from assistive technology.
 */
export type LabelElements = RefObject<Map<string, HTMLElement>>;

const LABEL_COLOURS: Record<SceneLabel["id"], string> = {
  embedment: COLOURS.embedment,
  clearance: COLOURS.clearance,
  wind: COLOURS.wind,
  north: COLOURS.north,
};

/** The labels themselves, outside the canvas, hidden until the scene's first frame places them. */
export function LabelLayer({ labels, elements }: { labels: SceneLabel[]; elements: LabelElements }) {
  return (
    <div aria-hidden="true" className="pointer-events-none absolute inset-0 overflow-hidden" data-testid="preview-labels">
      {labels.map((l) => (
        <span
          key={l.id}
          ref={(el) => {
            if (el) elements.current.set(l.id, el);
            else elements.current.delete(l.id);
          }}
          data-preview-label={l.id}
          className={`invisible absolute top-0 left-0 rounded bg-white/85 px-1 leading-tight whitespace-nowrap shadow-sm ${l.id === "north" ? "text-[15px] font-bold" : "text-[13px] font-medium"}`}
          style={{ color: LABEL_COLOURS[l.id] }}
        >
          {l.text}
        </span>
      ))}
    </div>
  );
}

/** Each label's measured box, read again only when its text changed (so a frame forces no layout). */
export type LabelSizes = Map<string, { text: string; width: number; height: number }>;

const probe = new Vector3();

/**
 * At every frame the scene draws (a changed design, a camera move, a resize): projects each
 * label's point to the screen, places the labels by priority and moves the elements. Writes
 * styles only.
 */
export function placeLabelElements(labels: SceneLabel[], elements: Map<string, HTMLElement>, sizes: LabelSizes, camera: Camera, size: { width: number; height: number }): void {
  const requests: LabelRequest[] = [];
  for (const l of labels) {
    const el = elements.get(l.id);
    if (!el) continue;
    let measured = sizes.get(l.id);
    if (!measured || measured.text !== l.text) {
      measured = { text: l.text, width: el.offsetWidth, height: el.offsetHeight };
      sizes.set(l.id, measured);
    }
    probe.set(l.at[0], l.at[1], l.at[2]).project(camera);
    // Beyond the far plane or behind the camera: no place on screen.
    const anchor = probe.z > 1 || probe.z < -1 ? null : { x: ((probe.x + 1) / 2) * size.width, y: ((1 - probe.y) / 2) * size.height };
    requests.push({ id: l.id, priority: l.priority, anchor, width: measured.width, height: measured.height, fit: l.fit });
  }
  for (const p of placeLabels(requests, size)) {
    const el = elements.get(p.id);
    if (!el) continue;
    if (p.visible && p.rect) {
      el.style.transform = `translate(${Math.round(p.rect.x)}px, ${Math.round(p.rect.y)}px)`;
      el.style.visibility = "visible";
      el.dataset.spot = p.spot ?? "";
    } else {
      el.style.visibility = "hidden";
      el.dataset.spot = "";
    }
  }
}
