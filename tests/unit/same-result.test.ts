/**
 * The editor compares the server's saved result with the one it computes in the browser. Saved
 * results come back from jsonb with their keys reordered; that alone must not count as a
 * difference, while any changed value must.
 */
import { describe, expect, it } from "vitest";
import { sameResult } from "@/app/(workspace)/projects/[projectId]/designs/[designId]/_components/same-result";
import { defaultDesignInput, sizeDesign, type DesignResult } from "@/engine";

/** As PostgreSQL's jsonb returns objects: keys by length, then bytewise [PostgreSQL 16 docs, §8.14.4]. */
function jsonbOrder(value: unknown): unknown {
  if (Array.isArray(value)) return value.map(jsonbOrder);
  if (value && typeof value === "object") {
    const keys = Object.keys(value).sort((a, b) => a.length - b.length || (a < b ? -1 : a > b ? 1 : 0));
    return Object.fromEntries(keys.map((k) => [k, jsonbOrder((value as Record<string, unknown>)[k])]));
  }
  return value;
}

describe("sameResult", () => {
  const live = sizeDesign(defaultDesignInput);
  const saved = jsonbOrder(JSON.parse(JSON.stringify(live))) as DesignResult;

  it("treats a stored copy with reordered keys as the same result", () => {
    expect(JSON.stringify(saved)).not.toBe(JSON.stringify(live));
    expect(sameResult(live, saved)).toBe(true);
  });

  it("sees a changed footing depth or engine version", () => {
    expect(sameResult(live, { ...saved, footing: { ...saved.footing, depthIn: saved.footing.depthIn + 1 } })).toBe(false);
    expect(sameResult(live, { ...saved, engineVersion: "0.0.0-older" })).toBe(false);
  });
});
