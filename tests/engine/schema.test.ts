import { describe, expect, it } from "vitest";
import { DesignInputError, defaultDesignInput, designInputSchema, safeParseDesignInput, sizeDesign, zodIssuesToFieldErrors } from "../../engine/index";

type Draft = Record<string, Record<string, unknown>>;
function withField(section: "site" | "array" | "posts", field: string, value: unknown) {
  const d = structuredClone(defaultDesignInput) as unknown as Draft;
  d[section][field] = value;
  return d;
}
function issuesFor(input: unknown) {
  const r = safeParseDesignInput(input);
  expect(r.ok).toBe(false);
  return r.ok ? [] : r.issues;
}

describe("design input schema", () => {
  it("accepts the default design and fills defaults", () => {
    const r = designInputSchema.parse(defaultDesignInput);
    expect(r.posts.autoDiametersIn).toEqual([12, 18, 24, 30, 36]);
    expect(r.site.riskCategory).toBe("II");
  });
  it("NaN wind speed → message naming the field and range", () => {
    expect(issuesFor(withField("site", "windSpeedMph", Number.NaN))).toEqual([
      { path: "site.windSpeedMph", message: "Wind speed must be between 85 and 200 mph" },
    ]);
  });
  it("negative module size is rejected", () => {
    const [i] = issuesFor(withField("array", "moduleLengthIn", -5));
    expect(i).toEqual({ path: "array.moduleLengthIn", message: "Module length must be between 30 and 110 in" });
  });
  it("zero posts is rejected", () => {
    const [i] = issuesFor(withField("posts", "count", 0));
    expect(i.path).toBe("posts.count");
    expect(i.message).toBe("Number of posts must be a whole number between 2 and 20");
  });
  it("tilt outside 0–60° is rejected", () => {
    for (const t of [-1, 61]) {
      const [i] = issuesFor(withField("array", "tiltDeg", t));
      expect(i).toEqual({ path: "array.tiltDeg", message: "Tilt must be between 0 and 60 degrees" });
    }
  });
  it("unknown exposure is rejected", () => {
    const [i] = issuesFor(withField("site", "exposure", "E"));
    expect(i).toEqual({ path: "site.exposure", message: "Exposure category must be one of B, C, D" });
  });
  it("fill soil is refused with a pointer to a geotechnical report", () => {
    const [i] = issuesFor(withField("site", "soil", { method: "class", soilClass: "fill" }));
    expect(i.path).toBe("site.soil.soilClass");
    expect(i.message).toMatch(/no presumptive bearing value.*geotechnical report/);
  });
  it("a missing required field says it is required", () => {
    const d = structuredClone(defaultDesignInput) as unknown as Draft;
    delete d.site.frostDepthIn;
    const [i] = issuesFor(d);
    expect(i).toEqual({ path: "site.frostDepthIn", message: "Frost depth is required (between 0 and 120 in)" });
  });
  it("post spacing wider than the array is rejected on the spacing field", () => {
    const [i] = issuesFor(withField("posts", "spacingFt", 30));
    expect(i.path).toBe("posts.spacingFt");
    expect(i.message).toMatch(/^Post spacing must be between 1 and 6\.97 ft/);
  });
  it("several bad fields are all reported", () => {
    const d = withField("site", "windSpeedMph", 300);
    d.array.rows = 1.5;
    const paths = issuesFor(d).map((i) => i.path);
    expect(paths).toEqual(expect.arrayContaining(["site.windSpeedMph", "array.rows"]));
  });
  it("sizeDesign throws a DesignInputError carrying the field issues", () => {
    try {
      sizeDesign(withField("site", "windSpeedMph", 50));
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(DesignInputError);
      expect((e as DesignInputError).issues[0].path).toBe("site.windSpeedMph");
    }
  });
  it("zodIssuesToFieldErrors flattens paths with dots", () => {
    const r = designInputSchema.safeParse({});
    expect(r.success).toBe(false);
    if (!r.success) expect(zodIssuesToFieldErrors(r.error).map((i) => i.path)).toEqual(expect.arrayContaining(["site", "array", "posts"]));
  });
});

describe("missing sections", () => {
  it("names each missing section and what it holds, not zod's generic message", () => {
    const empty = safeParseDesignInput({});
    expect(empty.ok).toBe(false);
    if (empty.ok) return;
    const byPath = Object.fromEntries(empty.issues.map((i) => [i.path, i.message]));
    expect(byPath.site).toMatch(/^Site must be given/);
    expect(byPath.array).toMatch(/^Array must be given/);
    expect(byPath.posts).toMatch(/^Posts must be given/);
    const notObject = safeParseDesignInput("a design");
    expect(notObject.ok ? "" : notObject.issues[0].message).toMatch(/site, array and posts sections/);
  });
});
