import { describe, expect, it } from "vitest";
import type { z } from "zod";
import { CRITERIA_NUMBER_RANGES } from "@/app/(workspace)/criteria/_components/criteria-units";
import { siteSchema } from "@/engine/schema";

/** The number inside a schema that may carry a default (ground snow defaults to 0). */
function bounds(schema: z.ZodType): [number | null, number | null] {
  const inner = ("unwrap" in schema && typeof schema.unwrap === "function" ? schema.unwrap() : schema) as z.ZodNumber;
  return [inner.minValue, inner.maxValue];
}

describe("the criteria card form's range hints", () => {
  it("are the site schema's own bounds, criterion by criterion", () => {
    for (const [key, range] of Object.entries(CRITERIA_NUMBER_RANGES)) {
      expect(bounds(siteSchema.shape[key as keyof typeof siteSchema.shape] as z.ZodType), key).toEqual(range);
    }
  });
});
