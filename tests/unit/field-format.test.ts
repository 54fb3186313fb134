import { describe, expect, it } from "vitest";
import { bearing, ftIn, quarterIn } from "@/app/_lib/review/field-format";

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

// Compass bearings clockwise from north, eight points 45° apart, each point the middle of its
// sector (N covers 337.5°–22.5°) [common practice: compass convention].
describe("compass bearing", () => {
  it("names the nearest of the eight points", () => {
    expect(bearing(180)).toBe("180° (S)");
    expect(bearing(0)).toBe("0° (N)");
    expect(bearing(360)).toBe("360° (N)");
    expect(bearing(90)).toBe("90° (E)");
    expect(bearing(172.5)).toBe("172.5° (S)");
    expect(bearing(225)).toBe("225° (SW)");
    expect(bearing(337.6)).toBe("337.6° (N)");
    expect(bearing(337.4)).toBe("337.4° (NW)");
  });
});
