/**
 * `POST /api/calc?sections=`: API callers can leave out the parts of the result they do not need
 * (the preview geometry and per-post tables are most of the reply); the engine version and the
 * preliminary-sizing cautions always come with it; an unknown section is a 422 naming `sections`.
 */
import { describe, expect, it } from "vitest";
import { POST as calc } from "@/app/api/calc/route";
import { defaultDesignInput, sizeDesign } from "@/engine";
import { actAs, jsonRequest } from "../support/next-context";

describe("POST /api/calc?sections=", () => {
  it("sends only the sections named, with the engine version and cautions, equal to the whole result's", async () => {
    await actAs("designer@demo.pierwise.test");
    const full = await calc(jsonRequest("POST", "/api/calc", defaultDesignInput), {});
    const fullText = await full.text();
    const part = await calc(jsonRequest("POST", "/api/calc?sections=footing,concrete", defaultDesignInput), {});
    expect(part.status).toBe(200);
    const partText = await part.text();
    const { result } = JSON.parse(partText);
    expect(Object.keys(result).sort()).toEqual(["caution", "cautions", "concrete", "engineVersion", "footing"]);
    const expected = JSON.parse(JSON.stringify(sizeDesign(defaultDesignInput)));
    expect(result.footing).toEqual(expected.footing);
    expect(result.concrete).toEqual(expected.concrete);
    expect(result.cautions).toEqual(expected.cautions);
    expect(partText.length).toBeLessThan(fullText.length / 2);
  });

  it("takes repeated parameters too, and a whole result without the parameter", async () => {
    await actAs("designer@demo.pierwise.test");
    const both = await (await calc(jsonRequest("POST", "/api/calc?sections=footing&sections=warnings", defaultDesignInput), {})).json();
    expect(Object.keys(both.result)).toEqual(expect.arrayContaining(["footing", "warnings"]));
    expect(both.result.geometryPreview).toBeUndefined();
    const whole = await (await calc(jsonRequest("POST", "/api/calc", defaultDesignInput), {})).json();
    expect(whole.result.geometryPreview).toBeDefined();
    expect(whole.result.postLoads.length).toBeGreaterThan(0);
  });

  it("refuses an unknown or empty section list with a 422 naming `sections`", async () => {
    await actAs("designer@demo.pierwise.test");
    for (const query of ["sections=footing,everything", "sections="]) {
      const response = await calc(jsonRequest("POST", `/api/calc?${query}`, defaultDesignInput), {});
      expect(response.status).toBe(422);
      const { errors } = await response.json();
      expect(errors[0]).toMatchObject({ path: "sections", message: expect.stringMatching(/footing, concrete|name one or more of/) });
    }
  });

  it("still answers 401 signed out, and checks the member on every request (the unsealed cookie is reused, not the check)", async () => {
    await actAs("designer@demo.pierwise.test");
    expect((await calc(jsonRequest("POST", "/api/calc?sections=footing", defaultDesignInput), {})).status).toBe(200);
    await actAs(null);
    expect((await calc(jsonRequest("POST", "/api/calc?sections=footing", defaultDesignInput), {})).status).toBe(401);
  });
});

describe("the cheaper signed-in check of POST /api/calc", () => {
  it("passes a member who passed the full check moments ago, and still refuses a cookie that never did", async () => {
    await actAs("designer@demo.pierwise.test");
    expect((await calc(jsonRequest("POST", "/api/calc?sections=footing", defaultDesignInput), {})).status).toBe(200);
    expect((await calc(jsonRequest("POST", "/api/calc?sections=footing", defaultDesignInput), {})).status).toBe(200);
    // A cookie sealed for a user id that is no member anywhere never passes (db/seeds: no such id).
    const { sealData } = await import("iron-session");
    const { sessionOptions } = await import("@/app/_lib/session");
    const { cookies } = await import("next/headers");
    const options = sessionOptions();
    const seal = await sealData({ userId: "00000000-0000-4000-8000-00000000dead", organisationId: "00000000-0000-4000-8000-00000000beef", signedInAt: Date.now() }, { password: options.password, ttl: options.ttl });
    (await cookies()).set(options.cookieName, seal);
    expect((await calc(jsonRequest("POST", "/api/calc?sections=footing", defaultDesignInput), {})).status).toBe(401);
    expect((await calc(jsonRequest("POST", "/api/calc?sections=footing", defaultDesignInput), {})).status).toBe(401);
  });
});

describe("the section names", () => {
  it("cover every top-level part of a result, so a new part can be asked for by name", async () => {
    const { ALWAYS_SENT, RESULT_SECTIONS } = await import("@/app/_lib/calc-sections");
    const keys = Object.keys(sizeDesign(defaultDesignInput));
    expect([...ALWAYS_SENT, ...RESULT_SECTIONS]).toEqual(expect.arrayContaining(keys));
  });
});
