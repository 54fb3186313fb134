import { describe, expect, it } from "vitest";
import { pourFromAsBuilt } from "@/app/_lib/review/as-dug";
import { sizeDesign, twoPostDesignInput } from "@/engine";

describe("the pour from the holes as dug", () => {
  const r = sizeDesign(twoPostDesignInput);
  const od = r.footing.post.outsideDiameterIn;
  const cyl = (dIn: number, hIn: number) => (Math.PI * (dIn / 12) ** 2 * (hIn / 12)) / 4;
  it("is absent until a hole is logged", () => {
    expect(pourFromAsBuilt(r, [])).toBeNull();
  });
  it("uses each post's latest logged hole, less the post, and the designed hole for the rest", () => {
    const t0 = new Date("2026-12-01T10:00:00Z"), t1 = new Date("2026-12-01T11:00:00Z");
    const p = pourFromAsBuilt(r, [
      { postId: "P1", measuredDiameterIn: 30, measuredDepthIn: 100, recordedAt: t1 },
      { postId: "P1", measuredDiameterIn: 26, measuredDepthIn: 96, recordedAt: t0 },
    ])!;
    expect(p.loggedPostIds).toEqual(["P1"]);
    // cylinder less the post, π b² d / 4 [computed]
    expect(p.concrete.holes[0].concreteFt3).toBeCloseTo(cyl(30, 100) - cyl(od, 100), 6);
    expect(p.concrete.holes[1].concreteFt3).toBeCloseTo(cyl(r.footing.diameterIn, r.footing.depthIn) - cyl(od, r.footing.depthIn), 6);
    expect(p.concrete.wasteAllowancePct).toBe(r.input.posts.wasteAllowancePct);
    expect(p.concrete.orderYd3 % 0.25).toBe(0);
  });
});
