/**
 * The scene's short wind label, shared by the 3D scene and the 2D elevation. A module of its own
 * with no imports: the scene's chunk takes it without the unit formatter, and the preview shell
 * takes it without three.js.
 */
import type { PreviewGeometry } from "@/engine/geometry/preview";

/** "Wind onto the face, case A". */
export function windSceneLabel(wind: NonNullable<PreviewGeometry["wind"]>): string {
  return `Wind ${wind.windDirectionDeg === 180 ? "onto the face" : "from behind"}, case ${wind.loadCase}`;
}
