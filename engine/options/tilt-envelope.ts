/**
 * Tilt envelope for an adjustable rack: the footing depth each allowed tilt setting needs at the
 * chosen hole, and the governing tilt (deepest; ties go to the larger overturning moment).
 * The posts are set for the steepest setting's clearance and the modules pivot about the beam.
 */
import { footingDepth, type FootingContext } from "../footing/evaluate-footing";
import type { DepthCheckId } from "../footing/checks";
import { lateralFrontier } from "../loads/factored";

export interface TiltEnvelopeRow {
  tiltDeg: number;
  requiredDepthIn: number;
  controllingCheck: DepthCheckId;
  maxMomentAtGradeLbFt: number;
}

export function tiltEnvelope(ctx: FootingContext, tiltsDeg: number[], diameterIn: number): { rows: TiltEnvelopeRow[]; governingTiltDeg: number } {
  const rows = tiltsDeg.map((tiltDeg) => {
    const mine = ctx.rows.filter((r) => r.tiltDeg === tiltDeg);
    const ev = footingDepth({ ...ctx, rows: mine, lateralRows: lateralFrontier(mine) }, diameterIn, false);
    const maxMomentAtGradeLbFt = mine.reduce((m, r) => Math.max(m, Math.abs(r.momentAtGradeLbFt)), 0);
    return { tiltDeg, requiredDepthIn: ev.depthIn, controllingCheck: ev.controllingCheck, maxMomentAtGradeLbFt };
  });
  const gov = rows.reduce((a, r) =>
    r.requiredDepthIn > a.requiredDepthIn || (r.requiredDepthIn === a.requiredDepthIn && r.maxMomentAtGradeLbFt > a.maxMomentAtGradeLbFt) ? r : a,
  );
  return { rows, governingTiltDeg: gov.tiltDeg };
}
