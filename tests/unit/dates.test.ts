/**
 * One date helper, in the organisation's time zone: a stamp just after midnight UTC is still the
 * previous evening in Denver (UTC−7 in December, no daylight saving then [common practice: IANA
 * time zone database, America/Denver]), so a page must not print the UTC date.
 */
import { describe, expect, it } from "vitest";
import { dateTimeInWords, shortDate, shortDateTime, todayInZone } from "@/components/ui/dates";

const STAMP = new Date("2026-12-02T03:40:00Z");

describe("dates in the organisation's time zone", () => {
  it("gives the local date and time, with the zone named", () => {
    expect(shortDate(STAMP, "America/Denver")).toBe("Dec 1, 2026");
    expect(shortDateTime(STAMP, "America/Denver")).toMatch(/^Dec 1, 2026, 8:40\s?PM MST$/);
    expect(dateTimeInWords(STAMP, "America/Denver")).toMatch(/^December 1, 2026 at 8:40\s?PM MST$/);
    expect(todayInZone("America/Denver", STAMP)).toBe("2026-12-01");
    expect(todayInZone("UTC", STAMP)).toBe("2026-12-02");
  });

  it("falls back to UTC for an unknown zone instead of failing the page, and shows a dash for no date", () => {
    expect(shortDate(STAMP, "Not/AZone")).toBe("Dec 2, 2026");
    expect(shortDate(null, "America/Denver")).toBe("—");
  });
});
