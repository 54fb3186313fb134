/**
 * The pour recomputed from the as-built log: each post's latest logged hole (diameter and depth as
 * dug), the designed hole for posts not logged yet, through the engine's concreteFromHolesAsDug.
 * Pure (no database), so the field spec and its tests share it.
 */
import { concreteFromHolesAsDug, type ConcreteAsDug, type DesignResult } from "@/engine";

export interface AsDugPour {
  concrete: ConcreteAsDug;
  /** Posts whose hole came from the log; the rest use the designed hole. */
  loggedPostIds: string[];
}

/** null when nothing is logged yet (then the field spec shows the designed quantity only). */
export function pourFromAsBuilt(
  result: DesignResult,
  entries: { postId: string; measuredDiameterIn: number; measuredDepthIn: number; recordedAt: Date }[],
): AsDugPour | null {
  const latest = new Map<string, { measuredDiameterIn: number; measuredDepthIn: number; recordedAt: Date }>();
  for (const e of entries) {
    const prev = latest.get(e.postId);
    if (!prev || e.recordedAt >= prev.recordedAt) latest.set(e.postId, e);
  }
  const posts = result.field.posts;
  const logged = posts.filter((p) => latest.has(p.id)).map((p) => p.id);
  if (logged.length === 0) return null;
  const od = result.footing.post.outsideDiameterIn;
  const holes = posts.map((p) => {
    const e = latest.get(p.id);
    // A logged hole narrower than the post cannot hold it: it is on hold already; count the post's
    // own diameter plus a hair so the sum stays finite.
    return e
      ? { postId: p.id, diameterIn: Math.max(e.measuredDiameterIn, od + 0.01), depthIn: e.measuredDepthIn }
      : { postId: p.id, diameterIn: result.footing.diameterIn, depthIn: p.embedmentIn };
  });
  const concrete = concreteFromHolesAsDug({
    holes, postOutsideDiameterIn: od, unitWeightPcf: result.input.posts.concreteUnitWeightPcf, wasteAllowancePct: result.input.posts.wasteAllowancePct,
  });
  return { concrete, loggedPostIds: logged };
}
