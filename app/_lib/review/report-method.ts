/**
 * The method as an engineer checks it: each step's formula, then the same formula with the
 * governing case's numbers put in, then the result. Every number is read from the saved result;
 * nothing here recomputes the design (the lateral step re-derives d from the engine's own inputs
 * to show the substitution, and states the engine's value beside it).
 */
import type { DesignResult } from "@/engine";
import { fmt } from "./report-model";
import { userText } from "./report-text";

export interface MethodStep {
  title: string;
  source: string;
  lines: string[];
}

const n = (v: number, d = 2) => fmt(v, d);

export function methodSteps(r: DesignResult): MethodStep[] {
  const v = r.wind.velocity;
  const V = r.input.site.windSpeedMph;
  const steps: MethodStep[] = [];
  const is716 = r.wind.edition === "7-16";
  steps.push({
    title: "1. Velocity pressure at the mean height of the array",
    source: is716 ? "ASCE 7-16 Eq. 26.10-1; Kz Table 26.10-1, Kd Table 26.6-1, Ke Table 26.9-1" : "ASCE 7-22 Eq. 26.10-1 (Kd applied with the pressure); Kz Table 26.10-1, Ke Table 26.9-1",
    lines: is716
      ? [
          "qz = 0.00256 · Kz · Kzt · Kd · Ke · V²",
          `qz = 0.00256 × ${n(v.kz, 3)} × ${n(v.kzt, 3)} × ${n(v.kd, 2)} × ${n(v.ke, 3)} × ${n(V, 0)}² = ${n(v.qzPsf, 2)} psf`,
          `at h = ${n(r.wind.heightFt, 2)} ft, exposure ${r.input.site.exposure}`,
        ]
      : [
          "qz = 0.00256 · Kz · Kzt · Ke · V², then qz · Kd",
          `qz = 0.00256 × ${n(v.kz, 3)} × ${n(v.kzt, 3)} × ${n(v.ke, 3)} × ${n(V, 0)}² = ${n(v.qzPsf, 2)} psf; qz · Kd = ${n(v.qzPsf, 2)} × ${n(v.kd, 2)} = ${n(v.qzWithKdPsf, 2)} psf`,
          `at h = ${n(r.wind.heightFt, 2)} ft, exposure ${r.input.site.exposure}`,
        ],
  });

  const gm = r.governingLoads.moment;
  const wc = gm.windCase >= 0 ? r.wind.cases[gm.windCase] : undefined;
  if (wc) {
    steps.push({
      title: `2. Net pressure and force on the array, governing wind case: ${wc.label}`,
      source: "ASCE 7 §27.3.2, Fig. 27.3-4 (free roofs, monoslope): p = qh · G · CN",
      lines: [
        "p = qz · Kd · G · CN on each half of the surface; F = Σ p · A",
        `windward half: p = ${n(v.qzWithKdPsf, 2)} × ${n(r.wind.gustFactor, 2)} × ${n(wc.cnWindward, 2)} = ${n(wc.windwardPressurePsf, 2)} psf`,
        `leeward half: p = ${n(v.qzWithKdPsf, 2)} × ${n(r.wind.gustFactor, 2)} × ${n(wc.cnLeeward, 2)} = ${n(wc.leewardPressurePsf, 2)} psf`,
        `surface A = ${n(r.geometry.surfaceAreaFt2, 1)} ft²: normal force F = ${n(wc.normalForceLb, 0)} lb; horizontal ${n(wc.horizontalLb, 0)} lb, downward ${n(wc.downwardLb, 0)} lb at tilt ${n(r.geometry.tiltDeg, 1)}°`,
      ],
    });
  }

  const post = r.postLoads.find((p) => p.postId === gm.postId);
  const row = post?.combinations.find((c) => c.combination === gm.combination);
  steps.push({
    title: `3. Loads at grade, post ${gm.postId}, combination ${gm.combination}`,
    source: "ASCE 7 §2.4.1 (allowable stress design load combinations)",
    lines: row
      ? [`shear P = ${n(row.shearLb, 0)} lb, moment at grade M = ${n(row.momentAtGradeLbFt, 0)} lb·ft, downward ${n(row.downwardLb, 0)} lb, wind uplift ${n(row.windUpliftLb, 0)} lb`]
      : [`moment at grade M = ${n(gm.valueLbFt ?? 0, 0)} lb·ft`],
  });

  const lateral = r.footing.checks.find((c) => c.id === "lateral");
  const lrow = lateral?.governing ? r.postLoads.find((p) => p.postId === lateral.governing!.postId)?.combinations.find((c) => c.combination === lateral.governing!.combination) : undefined;
  if (lateral && lrow) {
    const P = Math.abs(lrow.shearLb), M = Math.abs(lrow.momentAtGradeLbFt);
    const b = r.footing.diameterIn / 12;
    const S = r.footing.soil.lateralPsfPerFt;
    const dReq = r.footing.requiredDepthIn.lateral / 12;
    if (r.input.posts.constrainedAtGrade) {
      steps.push({
        title: "4. Lateral embedment, constrained at grade",
        source: userText(lateral.source),
        lines: [
          "d² = 4.25 · P · h / (S3 · b), S3 = S · d",
          `M = P·h = ${n(M, 0)} lb·ft, b = ${n(b, 2)} ft, S = ${n(S, 0)} psf/ft → d = ${n(dReq, 2)} ft (${n(r.footing.requiredDepthIn.lateral, 1)} in)`,
        ],
      });
    } else if (P > 0) {
      const h = M / P;
      const s1 = (S * Math.min(dReq, 12)) / 3;
      const A = (2.34 * P) / (s1 * b);
      const d = 0.5 * A * (1 + Math.sqrt(1 + (4.36 * h) / A));
      steps.push({
        title: "4. Lateral embedment, not constrained at grade",
        source: userText(lateral.source),
        lines: [
          "d = 0.5 · A · {1 + [1 + 4.36 · h / A]^½},  A = 2.34 · P / (S1 · b),  S1 = S · d / 3",
          `P = ${n(P, 0)} lb, h = M / P = ${n(M, 0)} / ${n(P, 0)} = ${n(h, 2)} ft, b = ${n(b, 2)} ft, S = ${n(S, 0)} psf/ft`,
          `S1 = ${n(S, 0)} × ${n(Math.min(dReq, 12), 2)} / 3 = ${n(s1, 1)} psf;  A = 2.34 × ${n(P, 0)} / (${n(s1, 1)} × ${n(b, 2)}) = ${n(A, 3)} ft`,
          `d = 0.5 × ${n(A, 3)} × {1 + [1 + 4.36 × ${n(h, 2)} / ${n(A, 3)}]^½} = ${n(d, 2)} ft = ${n(d * 12, 1)} in required`,
          `provided ${n(r.footing.depthIn, 1)} in: ratio ${n(lateral.ratio, 2)} ${lateral.pass ? "≤ 1.00, passes" : "> 1.00, FAILS"}`,
        ],
      });
    }
  }

  const others = r.footing.checks.filter((c) => c.id !== "lateral");
  steps.push({
    title: `5. Other footing checks at ${n(r.footing.diameterIn, 1)} in × ${n(r.footing.depthIn, 1)} in`,
    source: "each check's source as listed",
    lines: others.map((c) => `${c.title}: demand ${n(c.demand, 2)} ${c.unit} / capacity ${n(c.capacity, 2)} ${c.unit} = ratio ${n(c.ratio, 2)} ${c.pass ? "≤ 1.00" : "> 1.00, FAILS"} (${userText(c.source)})`),
  });
  const p = r.footing.post;
  steps.push({
    title: `6. Post: ${p.size} in standard pipe`,
    source: userText(p.source),
    lines: [
      "Ma = Fy · Z / Ωb (AISC 360 Chapter F, Ωb = 1.67)",
      `Ma = ${n(p.yieldKsi, 0)} ksi × ${n(p.plasticModulusIn3, 2)} in³ / 1.67 / 12 = ${n(p.allowableMomentKipFt, 2)} kip·ft`,
    ],
  });
  return steps;
}
