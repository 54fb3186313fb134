// Issue 17 (metric leftovers): sentences the app composes and saves in customary words — a new
// design's starting note (engine/options/starting-size.ts), a hold's reason (app/_lib/review/as-built.ts)
// — and the report's method steps read in the reader's units; a note a person typed stays as typed.
import { describe, expect, it } from "vitest";
import { methodSteps } from "@/app/_lib/review/report-method";
import { composedIn, sayIn } from "@/components/format/quantity-text";
import { revisionNoteIn, startingNote } from "@/components/format/revision-note";
import { toDisplay } from "@/components/format/quantity";
import { defaultDesignInput, parseDesignInput, sizeDesign, startingSize, type DesignInput } from "@/engine";
import { imperialText, pipeName, qty, quantitiesIn, says } from "@/engine/quantity-text";
import { PINNED_DESIGNS } from "../engine/pinned-designs";

/** A US customary unit word (as in tests/unit/metric-engine-texts.test.ts): "in" only after a number. */
const IMPERIAL = /\b(ft|lb|lbs|lbf|mph|psf|pcf|psi|ksi|kips?|inch|inches|feet|foot|pounds?)\b|yd³|ft³|ft²|°F|-lb\b|[\d¼½¾]\s*in\b/;

const base = parseDesignInput(defaultDesignInput);
const at = (windSpeedMph: number, over: Partial<DesignInput["site"]>, posts: Partial<DesignInput["posts"]> = {}): DesignInput =>
  ({ ...base, site: { ...base.site, windSpeedMph, ...over }, posts: { ...base.posts, ...posts } });

// Sites across the product's 85–200 mph range (engine/schema.ts), exposure B–D (ASCE 7-16 §26.7.3) and
// presumptive soil classes 1–5 (IBC 2021 Table 1806.2): passing starts, changed pipes and holes, and
// starts where nothing passes on four posts (advice with a post count, augers, bending).
const STARTS: [string, DesignInput][] = [
  ["demo", base],
  ["windy C class 3", at(125, { exposure: "C", soil: { method: "class", soilClass: 3 } })],
  ["extreme D class 5", at(180, { exposure: "D", soil: { method: "class", soilClass: 5 } })],
  ["200 mph D class 5, two posts", at(200, { exposure: "D", soil: { method: "class", soilClass: 5 } }, { count: 2 })],
  ["150 mph B class 4, small augers", at(150, { exposure: "B", soil: { method: "class", soilClass: 4 } }, { autoDiametersIn: [8, 10], maxAutoDepthIn: 48 })],
];

describe("a saved customary sentence read back as quantities", () => {
  it("words the same in metric as the structured sentence it was saved from", () => {
    const sentences = STARTS.flatMap(([, input]) => {
      const s = startingSize(input);
      return [...s.changesText, ...s.adviceText];
    });
    expect(sentences.length).toBeGreaterThan(4);
    for (const t of sentences) {
      const saved = imperialText(t);
      expect(sayIn(quantitiesIn(saved), "metric"), saved).toBe(sayIn(t, "metric"));
      expect(IMPERIAL.test(sayIn(quantitiesIn(saved), "metric")), saved).toBe(false);
      // US units: the saved sentence itself.
      expect(composedIn(saved, "imperial")).toBe(saved);
    }
  });

  it("reads numbers with thousands, decimals, minus signs and pipe trade sizes; leaves ids and words alone", () => {
    const t = says`Post P2 at ${qty(2500, "psi")}, ${qty(10.5, "in", 1)} and ${qty(-3, "ft")}: ${pipeName("3-1/2")} in 4 holes`;
    expect(quantitiesIn(imperialText(t))).toEqual(t);
    // DN 90 for NPS 3 1/2 (ISO 6708 [common practice], components/format/quantity.ts).
    expect(composedIn("Use 3 1/2 in standard pipe in 24 in holes", "metric")).toBe("Use DN 90 standard pipe (NPS 3 1/2) in 610 mm holes");
    expect(composedIn("Hole P12 is 40 in deep, shallower than the 48 in specified.", "metric")).toBe("Hole P12 is 1,016 mm deep, shallower than the 1,219 mm specified.");
    expect(composedIn("Set it in the hole and check it in daylight", "metric")).toBe("Set it in the hole and check it in daylight");
  });
});

describe("revision 1's note, as the app writes it", () => {
  for (const [name, input] of STARTS) {
    it(`reads in metric with no US unit word: ${name}`, () => {
      const s = startingSize(input);
      const note = startingNote("Started from the Test County (test) criteria card.", s);
      expect(note).toMatch(/^Started from the Test County \(test\) criteria card\. (Every check passes|Fails a check at this size)\./);
      const metric = revisionNoteIn(note, "metric");
      expect(IMPERIAL.test(metric), metric).toBe(false);
      expect(revisionNoteIn(note, "imperial")).toBe(note);
      if (s.changes.length + s.advice.length) expect(metric).not.toBe(note);
    });
  }

  it("keeps a person's own note, and the card's own name, exactly as typed", () => {
    expect(revisionNoteIn("county confirmed 125 mph; 24 in auger on site", "metric")).toBe("county confirmed 125 mph; 24 in auger on site");
    const s = startingSize(at(125, { exposure: "C", soil: { method: "class", soilClass: 3 } }));
    const note = startingNote("Started from the Route 9 in Elk County (test) criteria card.", s);
    expect(revisionNoteIn(note, "metric")).toMatch(/^Started from the Route 9 in Elk County \(test\) criteria card\. Every check passes\. Sized: DN \d+ standard pipe/);
  });
});

describe("the report's method steps in metric", () => {
  const results = Object.entries(PINNED_DESIGNS).map(([name, draft]) => [name, sizeDesign(draft)] as const);

  it("write every step in SI units, with the velocity pressure in its SI form", () => {
    for (const [name, r] of results) {
      const steps = methodSteps(r, "metric");
      for (const s of steps) {
        for (const text of [s.title, s.source, ...s.lines]) expect(IMPERIAL.test(text), `${name}: ${text}`).toBe(false);
      }
      expect(steps[0].lines[0]).toMatch(/^qz = 0\.613 · Kz/);
      // Millimetres whole, as on every other metric screen (components/format/quantity.ts).
      expect(steps.flatMap((s) => [s.title, ...s.lines]).join(" "), name).not.toMatch(/\d\.\d+ mm\b/);
      expect(steps[0].lines.join(" ")).toContain("(qz in N/m², V in m/s)");
    }
  });

  it("substitute numbers that give the engine's own results (the steps agree with the tables)", () => {
    for (const [name, r] of results) {
      const [velocity] = methodSteps(r, "metric");
      // 0.613 × Kz Kzt Kd Ke V² in N/m² (ASCE 7-16 Eq. 26.10-1, SI form) within the constant's rounding (0.6133 → 0.613).
      const v = r.wind.velocity;
      const Vs = toDisplay(r.input.site.windSpeedMph, "mph", "metric");
      const byHand = 0.613 * v.kz * v.kzt * (r.wind.edition === "7-16" ? v.kd : 1) * v.ke * Vs ** 2;
      const shown = Number(/= ([\d,]+) N\/m²/.exec(velocity.lines[1])![1].replace(/,/g, ""));
      expect(Math.abs(shown - byHand) / byHand, name).toBeLessThan(0.002);
      const lateral = methodSteps(r, "metric").find((s) => s.title.startsWith("4. Lateral embedment, not constrained"));
      if (lateral) {
        // Eq. 18-1 (IBC §1807.3.2.1) substituted in kN, m and kPa gives the same depth as in lb, ft and psf.
        // (A design whose equation needs more than the engine's 60 ft search limit prints no solved d.)
        const mLine = lateral.lines.find((l) => /\} = [\d.]+ m = /.test(l));
        const us = methodSteps(r, "imperial").find((s) => s.title === lateral.title)!;
        const ftLine = us.lines.find((l) => /\} = [\d.]+ ft = /.test(l));
        expect(Boolean(mLine), name).toBe(Boolean(ftLine));
        if (!mLine || !ftLine) continue;
        const d = Number(/\} = ([\d.]+) m = /.exec(mLine)![1]);
        const dFt = Number(/\} = ([\d.]+) ft = /.exec(ftLine)![1]);
        expect(d, name).toBeCloseTo(toDisplay(dFt, "ft", "metric"), 2);
      }
    }
  });

  it("keep the US customary steps unchanged in US units", () => {
    const [, r] = results[0];
    const steps = methodSteps(r, "imperial");
    expect(steps[0].lines[0]).toMatch(/^qz = 0\.00256 · Kz/);
    expect(steps.flatMap((s) => s.lines).join(" ")).toMatch(/ psf/);
  });
});
