// Every code section the engine prints, checked against the section's title. Titles: IBC 2018/2021
// Ch. 18, ASCE 7-16 Ch. 2/7/26/27, AISC 360-16 [memory: section titles as recalled; confirm
// against the printed standards].
import { describe, expect, it } from "vitest";
import { defaultDesignInput, sizeDesign } from "../../engine/index";

const TITLES: Record<string, string> = {
  "IBC §1806.3.4": "Increase for poles",
  "IBC §1807.3.2.1": "Nonconstrained",
  "IBC §1807.3.2.2": "Constrained",
  "IBC §1807.3.3": "Backfill",
  "IBC §1809.4": "Depth and width of footings (12 in minimum depth)",
  "IBC §1809.5": "Frost protection",
  "ASCE 7 §2.4.1": "Basic combinations (ASD)",
  "ASCE 7 §7.3.4": "Minimum snow loads for low-slope roofs",
  "ASCE 7 §7.4": "Sloped roof snow loads",
  "ASCE 7 §26.8": "Topographic effects",
  "ASCE 7 §26.9": "Ground elevation factor",
  "ASCE 7 §26.11": "Gust effects",
  "ASCE 7 §27.3.2": "Open buildings with monoslope, pitched or troughed free roofs",
  "AISC 360-16 §F8": "Round HSS",
  "AISC 360-16 §B4.2": "Design wall thickness for HSS",
};

/** Each "§x.y" in a text with the code it belongs to (the nearest IBC / ASCE 7 / AISC before it). */
function cited(text: string): string[] {
  const out: string[] = [];
  const re = /(IBC|ASCE 7(?:-\d\d)?|AISC 360-16)|§\s?([0-9A-Z][0-9.]*[0-9])/g;
  let code = "";
  for (let m = re.exec(text); m; m = re.exec(text)) {
    if (m[1]) code = m[1].startsWith("ASCE") ? "ASCE 7" : m[1];
    else out.push(`${code} §${m[2]}`);
  }
  return out;
}

describe("code citations", () => {
  const variants = [
    defaultDesignInput,
    { ...defaultDesignInput, posts: { ...defaultDesignInput.posts, constrainedAtGrade: true, isolatedPoleIncrease: true } },
  ];
  it("every printed section is one whose title fits what it is cited for", () => {
    for (const v of variants) {
      const r = sizeDesign(v);
      const texts = [...r.references.sections, ...r.footing.checks.map((c) => c.source), ...r.warnings.map((w) => w.message)];
      for (const t of texts) for (const s of cited(t)) expect(TITLES, `${s} in "${t}"`).toHaveProperty([s]);
    }
  });
  it("§1809.4 is the 12 in minimum depth and §1809.5 frost protection, not the other way round", () => {
    const r = sizeDesign(defaultDesignInput);
    const frost = r.footing.checks.find((c) => c.id === "frost")!;
    expect(frost.source).toMatch(/§1809\.4 \(depth of footings, 12 in minimum\), §1809\.5 \(frost protection\)/);
    expect(r.references.sections.join("\n")).toMatch(/§1809\.4 depth of footings \(12 in minimum\); §1809\.5 frost protection/);
    expect(r.references.sections.join("\n")).not.toMatch(/1809\.4[^;]*frost/);
  });
});
