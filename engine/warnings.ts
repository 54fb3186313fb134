/**
 * Warnings: every method limit the design crosses, each with a code and a message a reviewer can
 * act on. Refusals (fill soil, wind speed out of range, …) are errors at the schema instead.
 */
import type { FootingEvaluation } from "./footing/evaluate-footing";
import type { ArrayLoadState } from "./loads/array-loads";
import type { DesignInput } from "./schema";
import { checkQuantity, checkTitleText } from "./footing/checks";
import { WIND_ALONG_ROWS_NOT_CHECKED } from "./notices";
import { imperialText, qty, says, type QuantityText } from "./quantity-text";

export interface DesignWarning {
  code: string;
  severity: "info" | "warning";
  /** The sentence in US customary words (CLI, API; results saved before `text` was added have only this). */
  message: string;
  /** The same sentence with its numbers as quantities, for the screens to word in the reader's units. */
  text?: QuantityText;
}

/** Add a warning unless the same code and message is already listed. */
function add(out: DesignWarning[], code: string, text: QuantityText | string, severity: DesignWarning["severity"] = "warning"): void {
  const parts = typeof text === "string" ? [text] : text;
  const message = imperialText(parts);
  for (let i = 0; i < out.length; i++) if (out[i].code === code && out[i].message === message) return;
  out.push({ code, severity, message, text: parts });
}

/** A warning made outside this module (size-design's auto-diameter note), with both forms. */
export function warningOf(code: string, text: QuantityText, severity: DesignWarning["severity"] = "warning"): DesignWarning {
  return { code, severity, message: imperialText(text), text };
}

export function collectWarnings(input: DesignInput, states: ArrayLoadState[], ev: FootingEvaluation, extra: DesignWarning[]): DesignWarning[] {
  // `add` is module-level (not a closure made on every design) because this runs for every sizing.
  const out: DesignWarning[] = [];
  for (const s of states) {
    if (s.hOverL < 0.25 || s.hOverL > 1.0)
      add(out, "H_OVER_L_OUT_OF_RANGE", `At ${s.tiltDeg}° tilt h/L = ${s.hOverL.toFixed(2)}, outside 0.25–1.0 where ASCE 7 Fig. 27.3-4 applies; have the engineer confirm the wind coefficients.`);
    if (s.tiltDeg > 45) add(out, "TILT_ABOVE_45", `Tilt ${s.tiltDeg}° is above the 45° the free-roof figure covers; the 45° coefficients were used.`);
    if (s.tiltDeg < 7.5)
      add(out, "TILT_BELOW_7_5", `Tilt ${s.tiltDeg}° is below 7.5°: the free-roof figure's 0° row was used, and the coefficients jump between that row and the 7.5° row (the required depth can change by a whole step between 7.4° and 7.5°); have the engineer confirm the wind coefficients.`);
    if (input.site.edition === "7-22" && s.snow.minimumPmPsf > 0)
      add(out, "SNOW_MINIMUM_7_16_RULE", says`At ${s.tiltDeg}° tilt (under 15°) the minimum snow load used the ASCE 7-16 §7.3.4 rule (pm = pg up to ${qty(20, "psf")}, else ${qty(20, "psf")}, without Is as 7-22 drops it); the ASCE 7-22 rule was not available to follow here: confirm against the printed standard.`);
    if (s.heights.minClearanceIn < input.array.lowestEdgeClearanceIn - 1e-6)
      add(out, "CLEARANCE_BELOW_TARGET", says`At ${s.tiltDeg}° the lowest edge clears grade by ${qty(s.heights.minClearanceIn, "in")}, less than the ${qty(input.array.lowestEdgeClearanceIn, "in")} asked for.`);
  }
  if (input.array.lowestEdgeClearanceIn < 18)
    add(out, "LOW_CLEARANCE", says`Lowest edge clearance ${qty(input.array.lowestEdgeClearanceIn, "in")} is under the usual ${qty(18, "in")} to ${qty(24, "in")}; allow for snow, vegetation and splash.`);
  add(out, "WIND_ALONG_ROWS_NOT_CHECKED", WIND_ALONG_ROWS_NOT_CHECKED);
  if (input.site.edition === "7-22") add(out, "FREE_ROOF_FOR_7_22", "ASCE 7-22 has provisions specific to ground-mounted solar; this engine uses the free-roof method for 7-22 as for 7-16.", "info");
  if (input.posts.isolatedPoleIncrease) add(out, "LATERAL_DOUBLED", says`IBC §1806.3.4 doubling of lateral bearing is applied: valid only for isolated poles not adversely affected by ${qty(0.5, "in")} motion at grade.`);
  if (input.posts.bearingPressure === "net")
    add(out, "NET_BEARING_USED", says`Bearing is checked on net pressure (soil removed credited at ${qty(input.posts.soilUnitWeightPcf, "pcf")}): an engineer's option, valid only against a net allowable bearing value.`);
  if (input.posts.sideFrictionPsf) add(out, "SIDE_FRICTION_USED", says`Side friction of ${qty(input.posts.sideFrictionPsf, "psf")} is counted against uplift: an engineer's value, not a presumptive one.`);
  if (input.site.waterTableDepthFt !== undefined && input.site.waterTableDepthFt * 12 < ev.depthIn)
    add(out, "WATER_TABLE", "The footing reaches the water table: buoyant concrete weight was used for uplift; the hole may need casing or tremie concrete.");
  if (ev.depthIn > 144) add(out, "DEPTH_OVER_12_FT", says`Footing deeper than ${qty(12, "ft")}: S1 is capped at its ${qty(12, "ft")} value and the post-in-hole method is being stretched.`);
  if (ev.requiredDepthIn.uplift >= 720 - 1e-6) add(out, "UPLIFT_NOT_CONVERGED", says`Uplift needs more than ${qty(60, "ft")} of pier: enlarge the hole, add posts, or have the engineer add side friction or an anchor.`);
  if (!ev.lateralConverged) add(out, "LATERAL_NOT_CONVERGED", says`The lateral check needs more than ${qty(60, "ft")} of embedment: enlarge the hole, add posts or revisit the soil values.`);
  const frost = ev.checks.find((c) => c.id === "frost")!;
  if (!frost.pass) add(out, "FROST_DEPTH_NOT_MET", says`Footing depth ${qty(ev.depthIn, "in")} is above the required ${qty(frost.demand, "in")} (frost depth or ${qty(12, "in")} minimum).`);
  for (const c of ev.checks) {
    if (c.id !== "frost" && !c.pass)
      add(out, `CHECK_OVER_CAPACITY_${c.id.toUpperCase()}`, says`${checkTitleText(c.id)}: utilisation ${c.ratio.toFixed(2)} exceeds 1.00 (${checkQuantity(c, c.demand)} vs ${checkQuantity(c, c.capacity)})${c.governing ? `, post ${c.governing.postId}, ${c.governing.combination}` : ""}.`);
  }
  return [...out, ...extra];
}
