/**
 * The method as an engineer checks it: each step's formula, then the same formula with the
 * governing case's numbers put in, then the result. Every number is read from the saved result;
 * nothing here recomputes the design (the lateral step re-derives d from the engine's own inputs
 * to show the substitution, and states the engine's value beside it).
 *
 * In metric every step is written in SI units. The IBC embedment equations (§1807.3.2.1 Eq. 18-1,
 * §1807.3.2.2 Eq. 18-2) and the AISC moment are dimensionally consistent, so they take kN, m and kPa
 * as they stand. Only the velocity pressure carries a unit-bound constant: its SI form uses 0.613
 * (N/m² with V in m/s), which is the customary 0.00256 (psf with V in mph) converted:
 * 0.00256 × 47.880 Pa/psf ÷ 0.44704² (m/s per mph)² = 0.6133. The results shown are the engine's own
 * values converted, so they agree with every table of the report.
 */
import type { DesignResult } from "@/engine";
import { formatPipeSize, formatQuantity, toDisplay, type UnitKind, type UnitSystem } from "@/components/format/quantity";
import { checkSourceIn, checkTitleIn } from "@/components/format/quantity-text";
import { CHECK_UNIT_KINDS } from "@/engine/footing/checks";
import { toMetric } from "@/engine/units";
import { fmt } from "./report-model";
import { userText } from "./report-text";

export interface MethodStep {
  title: string;
  source: string;
  lines: string[];
}

const n = (v: number, d = 2) => fmt(v, d);

/** One system's units for the method: the value converted, and its unit word. */
function unitsOf(system: UnitSystem) {
  const si = system === "metric";
  return {
    si,
    v: (value: number, kind: UnitKind) => toDisplay(value, kind, system),
    /** A formatted quantity with `d` decimals in this system. */
    q: (value: number, kind: UnitKind, d: number) => formatQuantity(value, kind, system, si ? { metricDecimals: d } : { decimals: d }),
    force: si ? "kN" : "lb", moment: si ? "kN·m" : "lb·ft", length: si ? "m" : "ft", pressure: si ? "kPa" : "psf", gradient: si ? "kPa/m" : "psf/ft",
  };
}

export function methodSteps(r: DesignResult, system: UnitSystem = "imperial"): MethodStep[] {
  const v = r.wind.velocity;
  const V = r.input.site.windSpeedMph;
  const steps: MethodStep[] = [];
  const is716 = r.wind.edition === "7-16";
  const u = unitsOf(system);
  if (u.si) {
    // SI form of ASCE 7 Eq. 26.10-1 (see the module comment for the constant).
    const Vs = u.v(V, "mph");
    const qz = u.v(v.qzPsf, "psf"), qzKd = u.v(v.qzWithKdPsf, "psf");
    steps.push({
      title: "1. Velocity pressure at the mean height of the array",
      source: `${is716 ? "ASCE 7-16 Eq. 26.10-1, in SI units; Kz Table 26.10-1, Kd Table 26.6-1, Ke Table 26.9-1" : "ASCE 7-22 Eq. 26.10-1, in SI units (Kd applied with the pressure); Kz Table 26.10-1, Ke Table 26.9-1"}. 0.613 is the equation's customary constant, 0.00256, converted to N/m² with V in m/s.`,
      lines: is716
        ? [
            "qz = 0.613 · Kz · Kzt · Kd · Ke · V²   (qz in N/m², V in m/s)",
            `qz = 0.613 × ${n(v.kz, 3)} × ${n(v.kzt, 3)} × ${n(v.kd, 2)} × ${n(v.ke, 3)} × ${n(Vs, 1)}² = ${n(qz * 1000, 0)} N/m² = ${n(qz, 3)} kPa`,
            `at h = ${u.q(r.wind.heightFt, "ft", 2)}, exposure ${r.input.site.exposure}`,
          ]
        : [
            "qz = 0.613 · Kz · Kzt · Ke · V², then qz · Kd   (qz in N/m², V in m/s)",
            `qz = 0.613 × ${n(v.kz, 3)} × ${n(v.kzt, 3)} × ${n(v.ke, 3)} × ${n(Vs, 1)}² = ${n(qz * 1000, 0)} N/m² = ${n(qz, 3)} kPa; qz · Kd = ${n(qz, 3)} × ${n(v.kd, 2)} = ${n(qzKd, 3)} kPa`,
            `at h = ${u.q(r.wind.heightFt, "ft", 2)}, exposure ${r.input.site.exposure}`,
          ],
    });
  } else steps.push({
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

  // Pressures to 2 decimals in psf, 3 in kPa (a kPa is 21 psf); forces whole lb or kN to 0.01.
  const pq = (psf: number) => n(u.v(psf, "psf"), u.si ? 3 : 2);
  const fq = (lb: number) => u.q(lb, "lb", u.si ? 2 : 0);
  const mq = (lbFt: number) => u.q(lbFt, "lbFt", u.si ? 2 : 0);
  const gm = r.governingLoads.moment;
  const wc = gm.windCase >= 0 ? r.wind.cases[gm.windCase] : undefined;
  if (wc) {
    steps.push({
      title: `2. Net pressure and force on the array, governing wind case: ${wc.label}`,
      source: "ASCE 7 §27.3.2, Fig. 27.3-4 (free roofs, monoslope): p = qh · G · CN",
      lines: [
        "p = qz · Kd · G · CN on each half of the surface; F = Σ p · A",
        `windward half: p = ${pq(v.qzWithKdPsf)} × ${n(r.wind.gustFactor, 2)} × ${n(wc.cnWindward, 2)} = ${pq(wc.windwardPressurePsf)} ${u.pressure}`,
        `leeward half: p = ${pq(v.qzWithKdPsf)} × ${n(r.wind.gustFactor, 2)} × ${n(wc.cnLeeward, 2)} = ${pq(wc.leewardPressurePsf)} ${u.pressure}`,
        `surface A = ${u.q(r.geometry.surfaceAreaFt2, "ft2", u.si ? 2 : 1)}: normal force F = ${fq(wc.normalForceLb)}; horizontal ${fq(wc.horizontalLb)}, downward ${fq(wc.downwardLb)} at tilt ${n(r.geometry.tiltDeg, 1)}°`,
      ],
    });
  }

  const post = r.postLoads.find((p) => p.postId === gm.postId);
  const row = post?.combinations.find((c) => c.combination === gm.combination);
  steps.push({
    title: `3. Loads at grade, post ${gm.postId}, combination ${gm.combination}`,
    source: "ASCE 7 §2.4.1 (allowable stress design load combinations)",
    lines: row
      ? [`shear P = ${fq(row.shearLb)}, moment at grade M = ${mq(row.momentAtGradeLbFt)}, downward ${fq(row.downwardLb)}, wind uplift ${fq(row.windUpliftLb)}`]
      : [`moment at grade M = ${mq(gm.valueLbFt ?? 0)}`],
  });

  const lateral = r.footing.checks.find((c) => c.id === "lateral");
  const lrow = lateral?.governing ? r.postLoads.find((p) => p.postId === lateral.governing!.postId)?.combinations.find((c) => c.combination === lateral.governing!.combination) : undefined;
  if (lateral && lrow) {
    // The same substitution in the reader's system: Eq. 18-1 and 18-2 are dimensionless in form.
    const P = u.v(Math.abs(lrow.shearLb), "lb"), M = u.v(Math.abs(lrow.momentAtGradeLbFt), "lbFt");
    const b = u.v(r.footing.diameterIn / 12, "ft");
    const S = u.v(r.footing.soil.lateralPsfPerFt, "psfPerFt");
    const dReq = u.v(r.footing.requiredDepthIn.lateral / 12, "ft");
    const dCap = u.v(12, "ft"); // S1 taken at no more than 12 ft (3.66 m) deep, as the engine does
    const Pd = u.si ? 2 : 0, Sd = u.si ? 1 : 0;
    if (r.input.posts.constrainedAtGrade) {
      steps.push({
        title: "4. Lateral embedment, constrained at grade",
        source: userText(checkSourceIn(lateral, system)),
        lines: [
          "d² = 4.25 · P · h / (S3 · b), S3 = S · d",
          `M = P·h = ${n(M, Pd)} ${u.moment}, b = ${n(b, u.si ? 3 : 2)} ${u.length}, S = ${n(S, Sd)} ${u.gradient} → d = ${n(dReq, 2)} ${u.length} (${u.q(r.footing.requiredDepthIn.lateral, "in", u.si ? 0 : 1)})`,
        ],
      });
    } else if (P > 0) {
      const h = M / P;
      const s1 = (S * Math.min(dReq, dCap)) / 3;
      const A = (2.34 * P) / (s1 * b);
      const d = 0.5 * A * (1 + Math.sqrt(1 + (4.36 * h) / A));
      const dIn = u.si ? d / toMetric(1, "ft") * 12 : d * 12;
      steps.push({
        title: "4. Lateral embedment, not constrained at grade",
        source: userText(checkSourceIn(lateral, system)),
        lines: [
          `d = 0.5 · A · {1 + [1 + 4.36 · h / A]^½},  A = 2.34 · P / (S1 · b),  S1 = S · d / 3${u.si ? "   (P in kN, lengths in m, pressures in kPa)" : ""}`,
          `P = ${n(P, Pd)} ${u.force}, h = M / P = ${n(M, Pd)} / ${n(P, Pd)} = ${n(h, 2)} ${u.length}, b = ${n(b, u.si ? 3 : 2)} ${u.length}, S = ${n(S, Sd)} ${u.gradient}`,
          `S1 = ${n(S, Sd)} × ${n(Math.min(dReq, dCap), 2)} / 3 = ${n(s1, u.si ? 2 : 1)} ${u.pressure};  A = 2.34 × ${n(P, Pd)} / (${n(s1, u.si ? 2 : 1)} × ${n(b, u.si ? 3 : 2)}) = ${n(A, 3)} ${u.length}`,
          `d = 0.5 × ${n(A, 3)} × {1 + [1 + 4.36 × ${n(h, 2)} / ${n(A, 3)}]^½} = ${n(d, u.si ? 3 : 2)} ${u.length} = ${u.q(dIn, "in", u.si ? 0 : 1)} required`,
          `provided ${u.q(r.footing.depthIn, "in", u.si ? 0 : 1)}: ratio ${n(lateral.ratio, 2)} ${lateral.pass ? "≤ 1.00, passes" : "> 1.00, FAILS"}`,
        ],
      });
    }
  }

  const others = r.footing.checks.filter((c) => c.id !== "lateral");
  const checkQ = (c: (typeof others)[number], value: number) => {
    const kind = CHECK_UNIT_KINDS[c.unit] as UnitKind | undefined;
    // Customary to 2 decimals as before; metric by each unit's own rounding (mm whole, kN to 0.1).
    if (!kind) return `${n(value, 2)} ${c.unit}`;
    return u.si ? formatQuantity(value, kind, "metric") : u.q(value, kind, 2);
  };
  steps.push({
    title: `5. Other footing checks at ${u.q(r.footing.diameterIn, "in", u.si ? 0 : 1)} × ${u.q(r.footing.depthIn, "in", u.si ? 0 : 1)}`,
    source: "each check's source as listed",
    lines: others.map((c) => `${checkTitleIn(c, system)}: demand ${checkQ(c, c.demand)} / capacity ${checkQ(c, c.capacity)} = ratio ${n(c.ratio, 2)} ${c.pass ? "≤ 1.00" : "> 1.00, FAILS"} (${userText(checkSourceIn(c, system))})`),
  });
  const p = r.footing.post;
  steps.push({
    title: `6. Post: ${formatPipeSize(p.size, system)}`,
    source: userText(p.source),
    lines: u.si
      ? [
          "Ma = Fy · Z / Ωb (AISC 360 Chapter F, Ωb = 1.67)",
          `Ma = ${n(u.v(p.yieldKsi, "ksi"), 0)} MPa × ${n(toMetric(p.plasticModulusIn3, "in3"), 0)} mm³ / 1.67 / 10⁶ = ${n(u.v(p.allowableMomentKipFt, "kipFt"), 2)} kN·m`,
        ]
      : [
          "Ma = Fy · Z / Ωb (AISC 360 Chapter F, Ωb = 1.67)",
          `Ma = ${n(p.yieldKsi, 0)} ksi × ${n(p.plasticModulusIn3, 2)} in³ / 1.67 / 12 = ${n(p.allowableMomentKipFt, 2)} kip·ft`,
        ],
  });
  return steps;
}
