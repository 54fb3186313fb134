import { describe, expect, it } from "vitest";
import { ftIn, quarterIn } from "@/app/_lib/review/field-format";

// 12 in = 1 ft; tape reading to the nearest ¼ in [common practice].
describe("tape-measure formatting", () => {
  it("reads feet and inches to the nearest quarter", () => {
    expect(ftIn(90)).toBe("7 ft 6 in");
    expect(ftIn(142.75)).toBe("11 ft 10¾ in");
    expect(ftIn(125.5)).toBe("10 ft 5½ in");
    expect(ftIn(11.9)).toBe("1 ft 0 in");
    expect(ftIn(0)).toBe("0 in");
    expect(ftIn(-3.25)).toBe("−3¼ in");
  });
  it("rounds inches to a quarter", () => {
    expect(quarterIn(52.75000000000001)).toBe("52¾ in");
    expect(quarterIn(30)).toBe("30 in");
    expect(quarterIn(24.1)).toBe("24 in");
  });
});
