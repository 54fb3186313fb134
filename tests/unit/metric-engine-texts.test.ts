// Metric mode words every user-visible engine sentence in metric: each warning the engine can give
// (reached through designs built to cross each method limit), every check title and source, the
// site cautions, the cold-weather lines, the sections used, the input help, the schema's range
// messages and the laser cut instructions. None may keep a US customary unit word.
import { describe, expect, it } from "vitest";
import { checkSourceIn, checkTitleIn, rangeMessageIn, sayIn, storedIn, warningIn } from "@/components/format/quantity-text";
import { concreteLines, checksTable, governingLines, loadsTable, windTable } from "@/app/_lib/review/report-model";
import { resultFigures } from "@/components/design/revision-diff";
import { defaultDesignInput, safeParseDesignInput, sizeDesign, twoPostDesignInput, type DesignResult } from "@/engine";
import { COLD_WEATHER_TEXTS } from "@/engine/concrete/concrete-spec";
import { FIELD_LABELS } from "@/engine/field-labels";
import { levelingCuts } from "@/engine/field/leveling-cuts";
import { CHECK_TITLE_TEXTS } from "@/engine/footing/checks";
import { KNOWN_TEXTS } from "@/engine/known-texts";
import { SITE_CAUTION_TEXTS } from "@/engine/notices";
import { imperialText } from "@/engine/quantity-text";
import { PINNED_DESIGNS } from "../engine/pinned-designs";

/**
 * A US customary unit in a sentence: unit words that are never English words anywhere, and "in"
 * only right after a number or fraction ("4 in", "½ in"), so "in the hole" stays allowed.
 */
const IMPERIAL = /\b(ft|lb|lbs|lbf|mph|psf|pcf|psi|ksi|kips?|inch|inches|feet|foot|pounds?)\b|yd³|ft³|ft²|°F|-lb\b|[\d¼½¾]\s*in\b/;

type Draft = Record<string, Record<string, unknown>>;
const variant = (base: unknown, f: (d: Draft) => void) => {
  const d = structuredClone(base) as Draft;
  f(d);
  return d;
};

// Each crosses method limits that carry quantities in their words [common practice: engine/warnings.ts].
const DESIGNS: Record<string, unknown> = {
  ...PINNED_DESIGNS,
  lowClearance: variant(defaultDesignInput, (d) => { d.array.lowestEdgeClearanceIn = 10; }),
  snow722Flat: variant(defaultDesignInput, (d) => { d.site.edition = "7-22"; d.site.groundSnowPsf = 30; d.array.tiltDeg = 5; }),
  engineerOptions: variant(defaultDesignInput, (d) => {
    d.posts.isolatedPoleIncrease = true;
    d.posts.bearingPressure = "net";
    d.posts.sideFrictionPsf = 150;
    d.site.waterTableDepthFt = 2;
  }),
  shallowGiven: variant(twoPostDesignInput, (d) => { d.site.frostDepthIn = 60; d.posts.fixedDepthIn = 24; }),
};

const results: [string, DesignResult][] = Object.entries(DESIGNS).map(([name, draft]) => [name, sizeDesign(draft)]);

function expectMetric(text: string, where: string) {
  expect(IMPERIAL.test(text), `${where}: "${text}"`).toBe(false);
}

describe("engine sentences in metric", () => {
  it("the designs reach the warnings that carry quantities", () => {
    const codes = new Set(results.flatMap(([, r]) => r.warnings.map((w) => w.code)));
    for (const code of ["LOW_CLEARANCE", "SNOW_MINIMUM_7_16_RULE", "LATERAL_DOUBLED", "NET_BEARING_USED", "SIDE_FRICTION_USED", "FROST_DEPTH_NOT_MET", "CHECK_OVER_CAPACITY_BEARING", "CHECK_OVER_CAPACITY_POSTBENDING", "AUTO_DIAMETER_NO_REASONABLE_DEPTH"]) {
      expect(codes, code).toContain(code);
    }
  });

  it("every warning, check title and check source", () => {
    for (const [name, r] of results) {
      for (const w of r.warnings) {
        // The imperial sentence is unchanged in US units.
        expect(warningIn(w, "imperial")).toBe(w.message);
        expectMetric(warningIn(w, "metric"), `${name} ${w.code}`);
      }
      for (const c of r.footing.checks) {
        expectMetric(checkTitleIn(c, "metric"), `${name} check ${c.id}`);
        expectMetric(checkSourceIn(c, "metric"), `${name} source of ${c.id}`);
        expectMetric(sayIn(c.detailText, "metric"), `${name} detail of ${c.id}`);
      }
      for (const s of r.references.sections) expectMetric(storedIn(s, "metric"), `${name} section`);
      for (const c of r.cautions) expectMetric(storedIn(c, "metric"), `${name} caution`);
    }
  });

  it("the report's and the compare page's result lines", () => {
    for (const [name, r] of results) {
      const lines = [
        ...concreteLines(r, "metric"), ...governingLines(r, "metric"),
        ...[windTable(r, "metric"), loadsTable(r, "metric"), checksTable(r, "metric")].flatMap((t) => [t.title, t.note ?? "", ...t.columns, ...t.rows.flat()]),
        ...resultFigures(r, "metric").flatMap((row) => [row.label, typeof row.to === "string" ? row.to : ""]),
      ];
      for (const l of lines) expectMetric(l, name);
    }
  });

  it("fixed notices, help texts and the cut list", () => {
    const fixed = [...SITE_CAUTION_TEXTS, ...COLD_WEATHER_TEXTS, ...Object.values(CHECK_TITLE_TEXTS), ...KNOWN_TEXTS];
    for (const t of fixed) expectMetric(sayIn(t, "metric"), imperialText(t));
    for (const [path, f] of Object.entries(FIELD_LABELS)) expectMetric(f.helpText ? sayIn(f.helpText, "metric") : f.help, `help of ${path}`);
    for (const p of levelingCuts({ referenceReadingIn: 10, readingsIn: [10, 11.5, 9.25] }).posts) expectMetric(sayIn(p.instructionText, "metric"), "cut list");
  });

  it("every range message of a field with a unit", () => {
    for (const [path, f] of Object.entries(FIELD_LABELS)) {
      if (!f.unit) continue;
      const draft = variant(defaultDesignInput, (d) => {
        const [group, ...rest] = path.split(".");
        let at = d[group] as Record<string, unknown>;
        for (const k of rest.slice(0, -1)) at = at[k] as Record<string, unknown>;
        at[rest.at(-1)!] = -99999;
      });
      const parsed = safeParseDesignInput(draft);
      if (parsed.ok) continue;
      for (const issue of parsed.issues.filter((i) => i.path === path)) expectMetric(rangeMessageIn(issue.message, f.unit, "metric") ?? "", `range of ${path}`);
    }
  });

  it("words quantities by the formatter's rounding", () => {
    // 4 in = 101.6 mm (1 in = 25.4 mm exactly, NIST SP 811, 2008 edition, App. B.8), whole millimetres.
    expect(checkTitleIn({ id: "holeSize", title: "" }, "metric")).toBe("Hole at least 102 mm larger than the post");
    // 40 °F = 4.4 °C ((40 − 32) × 5/9, NIST SP 811, 2008 edition, §B.9), whole degrees.
    expect(sayIn(COLD_WEATHER_TEXTS[0], "metric")).toContain("air near or below 4 °C");
  });
});
