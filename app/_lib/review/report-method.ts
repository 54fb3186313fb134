/**
 * The method as an engineer checks it: each step's formula, then the same formula with the
 * governing case's numbers put in, then the result. Every number is read from the saved result;
 * nothing here recomputes the design. Steps 2–4 follow the row that sets the lateral depth
 * (`footing.lateralRequirement`, the engine's own working, possibly at another tilt setting than the
 * design tilt), and step 4 says which check governs the design depth and how it was rounded.
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
import { lateralWorking } from "@/engine/footing/embedment";
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

type Requirement = NonNullable<DesignResult["footing"]["lateralRequirement"]>;
type RowRef = { postId: string; tiltDeg: number; combination: string };
const sameRow = (a: RowRef, b: RowRef) => a.postId === b.postId && a.tiltDeg === b.tiltDeg && a.combination === b.combination;

/**
 * The engine's lateral working: stored in the result, or (for a result saved before it was) worked
 * by the engine's own function from the lateral check's row, only when that row is in the saved
 * post-load table (design tilt) and gives exactly the engine's required depth.
 */
export function lateralRequirementOf(r: DesignResult): Requirement | null {
  if (r.footing.lateralRequirement) return r.footing.lateralRequirement;
  if (r.footing.lateralRequirement === null) return null;
  const g = r.footing.checks.find((c) => c.id === "lateral")?.governing;
  if (!g || g.tiltDeg !== r.geometry.tiltDeg) return null;
  const row = r.postLoads.find((p) => p.postId === g.postId && p.tiltDeg === g.tiltDeg)?.combinations.find((c) => c.combination === g.combination);
  if (!row) return null;
  const w = lateralWorking({ shearLb: row.shearLb, momentLbFt: row.momentAtGradeLbFt, diameterFt: r.footing.diameterIn / 12, sPsfPerFt: r.footing.soil.lateralPsfPerFt, constrained: r.input.posts.constrainedAtGrade });
  if (Math.abs(w.depthFt * 12 - r.footing.requiredDepthIn.lateral) > 1e-6) return null;
  const wc = g.windCase >= 0 ? r.wind.cases[g.windCase] : undefined;
  return {
    ...w, governing: g, downwardLb: row.downwardLb, windUpliftLb: row.windUpliftLb,
    wind: wc ? { tiltDeg: g.tiltDeg, heightFt: r.wind.heightFt, velocity: r.wind.velocity, surfaceAreaFt2: r.geometry.surfaceAreaFt2, case: wc } : null,
  };
}

/** Old results: the largest moment's wind case, only when it is at the design tilt (the saved cases' tilt). */
function legacyWind(r: DesignResult): Requirement["wind"] {
  const gm = r.governingLoads.moment;
  const wc = gm.windCase >= 0 && gm.tiltDeg === r.geometry.tiltDeg ? r.wind.cases[gm.windCase] : undefined;
  return wc ? { tiltDeg: gm.tiltDeg, heightFt: r.wind.heightFt, velocity: r.wind.velocity, surfaceAreaFt2: r.geometry.surfaceAreaFt2, case: wc } : null;
}

const DEPTH_CHECK_WORDS: Record<string, string> = { lateral: "lateral embedment", uplift: "uplift", frost: "frost and minimum depth" };

/** Which check sets the design depth, every check's need, and how the depth was reached. */
function depthLines(r: DesignResult, system: UnitSystem, inQ: (inches: number) => string): string[] {
  const need = r.footing.requiredDepthIn;
  const needs = `needs: lateral ${inQ(need.lateral)}, uplift ${inQ(need.uplift)}, frost and minimum ${inQ(need.frost)}`;
  if (r.footing.depthMode === "given") return [`${needs}; the depth is given as ${inQ(r.footing.depthIn)}, not sized`];
  const inc = r.input.posts.depthIncrementIn;
  return [
    `${needs}; the largest, ${DEPTH_CHECK_WORDS[r.footing.controllingCheck] ?? r.footing.controllingCheck} (${inQ(need[r.footing.controllingCheck])}), governs the depth`,
    `design depth: ${inQ(need[r.footing.controllingCheck])} rounded up by the depth increment of ${formatQuantity(inc, "in", system, system === "metric" ? { metricDecimals: 0 } : { decimals: 2 })} = ${inQ(r.footing.depthIn)}`,
  ];
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
  const inQ = (inches: number) => u.q(inches, "in", u.si ? 0 : 1);
  const designTilt = r.geometry.tiltDeg;

  // Steps 2–4 follow the one row that sets the lateral depth, as the engine solved it. Its tilt can
  // be another of the rack's settings than the design tilt, so the wind and loads are that tilt's.
  const req = lateralRequirementOf(r);
  const rowName = (g: { postId: string; tiltDeg: number; combination: string }) =>
    `post ${g.postId}, combination ${g.combination}${g.tiltDeg !== designTilt ? `, at the rack's ${n(g.tiltDeg, 1)}° setting (design tilt ${n(designTilt, 1)}°)` : ""}`;
  const windStep = req?.wind ?? legacyWind(r);
  if (windStep) {
    const wc = windStep.case;
    const q = windStep.velocity.qzWithKdPsf;
    const otherTilt = windStep.tiltDeg !== designTilt;
    steps.push({
      title: `2. Net pressure and force on the array, wind case ${wc.label}${otherTilt ? `, tilt ${n(windStep.tiltDeg, 1)}°` : ""}`,
      source: "ASCE 7 §27.3.2, Fig. 27.3-4 (free roofs, monoslope): p = qh · G · CN",
      lines: [
        ...(otherTilt
          ? [`at the ${n(windStep.tiltDeg, 1)}° setting the mean height is h = ${u.q(windStep.heightFt, "ft", 2)}: Kz = ${n(windStep.velocity.kz, 3)}, qz · Kd = ${pq(q)} ${u.pressure} by the equation of step 1`]
          : []),
        "p = qz · Kd · G · CN on each half of the surface; F = Σ p · A",
        `windward half: p = ${pq(q)} × ${n(r.wind.gustFactor, 2)} × ${n(wc.cnWindward, 2)} = ${pq(wc.windwardPressurePsf)} ${u.pressure}`,
        `leeward half: p = ${pq(q)} × ${n(r.wind.gustFactor, 2)} × ${n(wc.cnLeeward, 2)} = ${pq(wc.leewardPressurePsf)} ${u.pressure}`,
        `surface A = ${u.q(windStep.surfaceAreaFt2, "ft2", u.si ? 2 : 1)}: normal force F = ${fq(wc.normalForceLb)}; horizontal ${fq(wc.horizontalLb)}, downward ${fq(wc.downwardLb)} at tilt ${n(windStep.tiltDeg, 1)}°`,
      ],
    });
  }

  const lateral = r.footing.checks.find((c) => c.id === "lateral");
  if (req) {
    steps.push({
      title: `3. Loads at grade, ${rowName(req.governing)}`,
      source: "ASCE 7 §2.4.1 (allowable stress design load combinations)",
      lines: [
        `shear P = ${fq(req.shearLb)}, moment at grade M = ${mq(req.momentAtGradeLbFt)}, downward ${fq(req.downwardLb)}, wind uplift ${fq(req.windUpliftLb)}`,
        "the row of the post-load table that needs the deepest lateral embedment",
      ],
    });
  } else {
    const gm = r.governingLoads.moment;
    steps.push({
      title: `3. Loads at grade, largest moment: ${rowName(gm)}`,
      source: "ASCE 7 §2.4.1 (allowable stress design load combinations)",
      lines: [`moment at grade M = ${mq(gm.valueLbFt ?? 0)}`],
    });
  }

  if (lateral) {
    const lines: string[] = [];
    const constrained = r.input.posts.constrainedAtGrade;
    if (req) {
      // Every value below is the engine's own (converted); Eq. 18-1/18-2 are dimensionally consistent.
      const P = u.v(req.shearLb, "lb"), M = u.v(req.momentAtGradeLbFt, "lbFt");
      const b = u.v(req.diameterFt, "ft"), S = u.v(req.sPsfPerFt, "psfPerFt");
      const sAt = u.v(req.bearingAtDepthPsf, "psf"), dAt = u.v(req.bearingDepthFt, "ft");
      const d = u.v(req.depthFt, "ft"), dIn = req.depthFt * 12;
      const Pd = u.si ? 2 : 0, Sd = u.si ? 1 : 0, bd = u.si ? 3 : 2, sd = u.si ? 2 : 1, dd = u.si ? 3 : 2;
      const atDepth = req.bearingDepthFt < req.depthFt ? ` (S taken at no more than ${u.q(12, "ft", u.si ? 2 : 0)})` : "";
      if (constrained) {
        lines.push(
          `d² = 4.25 · P · h / (S3 · b) = 4.25 · M / (S3 · b),  S3 = S · d${u.si ? "   (P in kN, lengths in m, pressures in kPa)" : ""}`,
          `M = ${n(M, Pd)} ${u.moment}, b = ${n(b, bd)} ${u.length}, S = ${n(S, Sd)} ${u.gradient}`,
          `S3 = ${n(S, Sd)} × ${n(dAt, 2)} = ${n(sAt, sd)} ${u.pressure}${atDepth}`,
        );
        lines.push(req.converged
          ? `d = [4.25 × ${n(M, Pd)} / (${n(sAt, sd)} × ${n(b, bd)})]^½ = ${n(d, dd)} ${u.length} = ${inQ(dIn)} required`
          : `no depth up to ${u.q(60, "ft", u.si ? 2 : 0)} satisfies Eq. 18-2 with these loads; the engine reports that limit, ${inQ(dIn)}, as required`);
      } else if (req.loadHeightFt === null || req.aFt === null) {
        lines.push(
          `pure moment at grade (P = 0): Eq. 18-1 as 4.36 · M ≤ 4 · d² · S1 · b / 2.34,  S1 = S · d / 3`,
          `M = ${n(M, Pd)} ${u.moment}, b = ${n(b, bd)} ${u.length}, S = ${n(S, Sd)} ${u.gradient}; S1 = ${n(S, Sd)} × ${n(dAt, 2)} / 3 = ${n(sAt, sd)} ${u.pressure}${atDepth}`,
          `d = ${n(d, dd)} ${u.length} = ${inQ(dIn)} required`,
        );
      } else {
        const h = u.v(req.loadHeightFt, "ft"), A = u.v(req.aFt, "ft");
        lines.push(
          `d = 0.5 · A · {1 + [1 + 4.36 · h / A]^½},  A = 2.34 · P / (S1 · b),  S1 = S · d / 3${u.si ? "   (P in kN, lengths in m, pressures in kPa)" : ""}`,
          `P = ${n(P, Pd)} ${u.force}, h = M / P = ${n(M, Pd)} / ${n(P, Pd)} = ${n(h, 2)} ${u.length}, b = ${n(b, bd)} ${u.length}, S = ${n(S, Sd)} ${u.gradient}`,
          `S1 = ${n(S, Sd)} × ${n(dAt, 2)} / 3 = ${n(sAt, sd)} ${u.pressure}${atDepth};  A = 2.34 × ${n(P, Pd)} / (${n(sAt, sd)} × ${n(b, bd)}) = ${n(A, 3)} ${u.length}`,
        );
        lines.push(req.converged
          ? `d = 0.5 × ${n(A, 3)} × {1 + [1 + 4.36 × ${n(h, 2)} / ${n(A, 3)}]^½} = ${n(d, dd)} ${u.length} = ${inQ(dIn)} required`
          : `no depth up to ${u.q(60, "ft", u.si ? 2 : 0)} satisfies Eq. 18-1 with these loads; the engine reports that limit, ${inQ(dIn)}, as required`);
      }
    } else {
      // A result saved before the engine stored its lateral working: its rows at other tilts are not
      // in the result, so no substitution is printed; the engine's values are stated as they stand.
      lines.push(
        constrained ? "d² = 4.25 · P · h / (S3 · b), S3 = S · d" : "d = 0.5 · A · {1 + [1 + 4.36 · h / A]^½},  A = 2.34 · P / (S1 · b),  S1 = S · d / 3",
        `${inQ(r.footing.requiredDepthIn.lateral)} required (engine); the worked substitution is not stored with this saved result: save the revision again to print it`,
      );
    }
    lines.push(...depthLines(r, system, inQ));
    lines.push(`provided ${inQ(r.footing.depthIn)}: lateral ratio ${n(lateral.ratio, 2)} ${lateral.pass ? "≤ 1.00, passes" : "> 1.00, FAILS"}${lateral.governing && req && !sameRow(lateral.governing, req.governing) ? ` (the worst row at this depth is ${rowName(lateral.governing)})` : ""}`);
    steps.push({
      title: `4. Lateral embedment, ${constrained ? "constrained" : "not constrained"} at grade${req ? `: ${rowName(req.governing)}` : ""}`,
      source: userText(checkSourceIn(lateral, system)),
      lines,
    });
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
