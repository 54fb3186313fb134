// The one formatter: each kind of quantity rounds one way per unit system, ratios always carry two
// decimals and say "fails" in words over 1.00, bag counts stay counts and name the bag's mass.
import { describe, expect, it } from "vitest";
import { formatBags, formatCount, formatFootingSize, formatPipeSize, formatQuantity, fromDisplay } from "@/components/format/quantity";
import { formatRatio, ratioFails, ratioWithVerdict } from "@/components/format/ratio";
import { tapeLength } from "@/components/format/tape";
import { rangeMessageIn } from "@/components/format/quantity-text";

describe("formatQuantity", () => {
  it("rounds metric by the unit: mm whole, kN and m/s to 0.1", () => {
    // 1 in = 25.4 mm exactly (NIST SP 811, 2008 edition, App. B.8): 42 in = 1,066.8 mm → 1,067 mm.
    expect(formatQuantity(42, "in", "metric")).toBe("1,067 mm");
    // 1 mi = 1,609.344 m exactly (NIST SP 811, 2008 edition, App. B.8): 140 mph = 62.5856 m/s → 62.6 m/s.
    expect(formatQuantity(140, "mph", "metric")).toBe("62.6 m/s");
    // 1 lbf = 4.4482216152605 N (NIST SP 811, 2008 edition, App. B.8): 1,392 lb = 6.19 kN → 6.2 kN.
    expect(formatQuantity(1392, "lb", "metric")).toBe("6.2 kN");
    // 1 yd³ = 0.764554857984 m³ exactly (NIST SP 811, 2008 edition, App. B.8): 1.25 yd³ → 0.96 m³.
    expect(formatQuantity(1.25, "yd3", "metric")).toBe("0.96 m³");
    // 1 lb = 0.45359237 kg exactly (NIST SP 811, 2008 edition, App. B.8): 80 lb → 36.3 kg.
    expect(formatQuantity(80, "lbMass", "metric")).toBe("36.3 kg");
    // (40 − 32) × 5/9 = 4.4 °C (NIST SP 811, 2008 edition, §B.9) → 4 °C.
    expect(formatQuantity(40, "degF", "metric")).toBe("4 °C");
  });

  it("writes US units as before, without a trailing .0", () => {
    expect(formatQuantity(1392, "lb", "imperial")).toBe("1,392 lb");
    expect(formatQuantity(18, "in", "imperial")).toBe("18 in");
    expect(formatQuantity(5.5, "ft", "imperial")).toBe("5.50 ft");
  });

  it("reads typed metric values back into the engine's units", () => {
    // 1,067 mm ÷ 25.4 = 42.008 in (NIST SP 811, 2008 edition, App. B.8).
    expect(fromDisplay(1067, "in", "metric")).toBeCloseTo(42.008, 3);
    expect(fromDisplay(4, "degF", "metric")).toBeCloseTo(39.2, 6);
  });

  it("words the footing, bags, pipes and tape lengths the same everywhere", () => {
    expect(formatFootingSize(18, 66, "imperial")).toBe("18 in diameter × 66 in deep");
    // 18 in = 457.2 mm; 66 in = 1,676.4 mm (NIST SP 811, 2008 edition, App. B.8).
    expect(formatFootingSize(18, 66, "metric")).toBe("457 mm diameter × 1,676 mm deep");
    expect(formatBags(12, 80, "imperial")).toBe("12 bags of 80 lb");
    expect(formatBags(12, 80, "metric")).toBe("12 bags of 36.3 kg");
    expect(formatCount(1234)).toBe("1,234");
    // NPS 3 ↔ DN 80 (ISO 6708 nominal sizes) [common practice].
    expect(formatPipeSize("3", "metric")).toBe("DN 80 standard pipe (NPS 3)");
    expect(formatPipeSize("2-1/2", "imperial")).toBe("2 1/2 in standard pipe");
    expect(tapeLength(66.25, "imperial")).toBe("5 ft 6¼ in");
    expect(tapeLength(66.25, "metric")).toBe("1,683 mm");
  });

  it("rewords a field's range message in metric", () => {
    // 85 mph = 38.0 m/s, 200 mph = 89.4 m/s (NIST SP 811, 2008 edition, App. B.8).
    expect(rangeMessageIn("Wind speed must be between 85 and 200 mph", "mph", "metric")).toBe("Wind speed must be between 38 and 89.4 m/s");
    expect(rangeMessageIn("Wind speed must be between 85 and 200 mph", "mph", "imperial")).toBe("Wind speed must be between 85 and 200 mph");
  });
});

describe("ratios", () => {
  it("always show two decimals and say fails in words over 1.00", () => {
    expect(formatRatio(0.7)).toBe("0.70");
    expect(formatRatio(Infinity)).toBe("over 99");
    // The engine's rule: a check passes at a ratio ≤ 1 (engine/footing/checks.ts); a failing ratio never reads 1.00.
    expect(ratioFails(1)).toBe(false);
    expect(ratioFails(1.004)).toBe(true);
    expect(formatRatio(1.004)).toBe("1.01");
    expect(ratioWithVerdict(1.03)).toBe("1.03 (over 1.00, fails)");
    expect(ratioWithVerdict(0.7)).toBe("0.70");
  });
});
