/**
 * Issue 17, items 4, 5 and 11: the review page and the compare page show every input by its label,
 * unit and meaning (never a dotted path, raw enum, true/false or null), check and warning codes as
 * words, inputs off the criteria card with the card's value beside them, and ratios over 1.0 marked.
 */
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import DiffPage from "@/app/(workspace)/projects/[projectId]/designs/[designId]/diff/page";
import ReviewPage from "@/app/(workspace)/reviews/[revisionId]/page";
import { POST as review } from "@/app/api/revisions/[revisionId]/review/route";
import { POST as submit } from "@/app/api/revisions/[revisionId]/submit/route";
import { inputValueText } from "@/components/design/input-values";
import { db } from "@/db/client";
import { sizeDesign, twoPostDesignInput, type DesignInputDraft } from "@/engine";
import { actAs, jsonRequest, params } from "../support/next-context";
import { DESIGNER, ENGINEER, addRevision, makeDesign, userId } from "../support/review-fixtures";

const html = async (node: Promise<React.ReactElement>) => renderToStaticMarkup(await node);
/** What a person reads: the page's text without tags or attributes (ids and option values stay internal). */
const text = (h: string) => h.replace(/<[^>]*>/g, " ").replace(/&amp;/g, "&").replace(/&#x27;/g, "'").replace(/\s+/g, " ");
const DOTTED_PATH = /\b(site|array|posts)\.[a-zA-Z]+/;

// The seeded demo card (db/seeds/02_demo_projects.ts) sets 115 mph and presumed soil class 4 (invented demo data).
const card = async () => db("criteria_cards").where({ jurisdiction: "Juniper Flats County (demo)" }).first("id", "values");

describe("input values in words", () => {
  it("shows choices by meaning, switches as Yes/No, blanks as not set, numbers with the table's unit", () => {
    // IBC 2021 Table 1806.2, class 4 = sand, silty sand, clayey sand … [memory]
    expect(inputValueText("site.soil.soilClass", 4)).toMatch(/^Presumed class 4 \(Sand/);
    expect(inputValueText("site.soil.method", "class")).toBe("Presumed class (IBC Table 1806.2)");
    expect(inputValueText("site.topography.method", "flat")).toBe("Flat or gently rolling");
    expect(inputValueText("posts.constrainedAtGrade", true)).toBe("Yes");
    expect(inputValueText("posts.constrainedAtGrade", false)).toBe("No");
    expect(inputValueText("site.waterTableDepthFt", null)).toBe("not set");
    expect(inputValueText("site.windSpeedMph", 140)).toBe("140 mph");
    expect(inputValueText("site.soil.allowableBearingPsf", 2500)).toBe("2,500 psf");
    expect(inputValueText("posts.autoDiametersIn", "12, 18, 24")).toBe("12 in, 18 in, 24 in");
  });
});

describe("review page", () => {
  it("lists every input and every change by label with unit and meaning, marks inputs off the criteria card, keeps pinned comments", async () => {
    const c = await card();
    const cardMph = Number(c.values.windSpeedMph);
    const off: DesignInputDraft = { ...twoPostDesignInput, site: { ...twoPostDesignInput.site, windSpeedMph: cardMph + 25, soil: { method: "class", soilClass: 5 } } };
    const d = await makeDesign({ criteriaCardId: c.id, input: off });
    await actAs(DESIGNER);
    expect((await submit(jsonRequest("POST", "/x", { engineerId: await userId(ENGINEER) }), params({ revisionId: d.revisionId }))).status).toBe(200);
    await actAs(ENGINEER);
    const decided = await review(jsonRequest("POST", "/x", { decision: "request-changes", comments: [{ fieldPath: "site.windSpeedMph", body: "Explain the higher wind speed." }] }), params({ revisionId: d.revisionId }));
    expect(decided.status).toBe(200);
    const rev2 = await addRevision(d.designId, { ...off, site: { ...off.site, windSpeedMph: cardMph + 35 } });

    await actAs(ENGINEER);
    const page = await html(ReviewPage({ params: Promise.resolve({ revisionId: rev2 }) }));
    const words = text(page);
    expect(words).not.toMatch(DOTTED_PATH);
    expect(words).toMatch(new RegExp(`Basic wind speed\\s*:\\s*${cardMph + 25} mph → ${cardMph + 35} mph`));
    expect(words).toMatch(/Presumed soil class\s+Presumed class 5 \(Clay/);
    expect(words).toMatch(/Soil values from\s+Presumed class \(IBC Table 1806\.2\)/);
    expect(words).toMatch(/Constrained at grade\s+No/);
    expect(words).not.toMatch(/>\s*(true|false|null|class)\s*</);
    // The card's value beside the input that differs, highlighted; an input equal to the card is not marked.
    expect(words).toContain(`Differs from the criteria card: card says ${cardMph} mph`);
    expect(words).toMatch(/Differs from the criteria card: card says Presumed class 4 \(Sand/);
    expect(page).toMatch(/bg-orange-100[^>]*>Differs from the criteria card: card says \d+ mph/);
    expect(words).toMatch(/Frost depth\s+36 in\s+(?!Differs)/);
    expect(words).toMatch(/Largest aggregate\s+0\.75 in/);
    // The comment pinned on revision 1 to the wind speed: named by its label, the path only inside ids.
    expect(words).toContain("Basic wind speed Explain the higher wind speed.");
    expect(page).toContain('id="input-site.windSpeedMph"');
  });
});

describe("compare page", () => {
  it("names changed inputs and results in words, formats ratios with two decimals and marks those over 1.0 as failing", async () => {
    const ok = sizeDesign(twoPostDesignInput);
    // Fixed 24 in depth fails at least one check (same case as tests/app/approval-signature.test.ts).
    const shallow: DesignInputDraft = { ...twoPostDesignInput, site: { ...twoPostDesignInput.site, frostDepthIn: 36 }, posts: { ...twoPostDesignInput.posts, fixedDepthIn: 24 } };
    const failing = sizeDesign(shallow).footing.checks.filter((x) => x.ratio > 1);
    expect(failing.length).toBeGreaterThan(0);
    const d = await makeDesign();
    const rev2 = await addRevision(d.designId, shallow);
    await actAs(DESIGNER);
    const page = await html(DiffPage({ params: Promise.resolve({ projectId: d.projectId, designId: d.designId }), searchParams: Promise.resolve({ from: d.revisionId, to: rev2 }) }));
    const words = text(page);
    expect(words).not.toMatch(DOTTED_PATH);
    expect(words).not.toMatch(/CHECK_[A-Z_]+/);
    expect(words).toMatch(/Given footing depth\s+not set\s+24 in/);
    // The same words on every screen (components/format/ratio-text.tsx), not colour alone.
    for (const f of failing) expect(words).toContain(`${f.ratio.toFixed(2)} over 1.00, fails`);
    expect(page).toMatch(/text-red-700[^>]*>\d+\.\d\d(<!-- -->)? ?<span[^>]*>over 1\.00, fails/);
    // Every utilisation reads with two decimals (0.70, never 0.7).
    for (const x of ok.footing.checks) expect(words).toMatch(new RegExp(`Utilisation: ${x.title.replace(/[()]/g, ".")}\\s+${x.ratio.toFixed(2)}`));
    const controlling = ok.footing.checks.find((x) => x.id === ok.footing.controllingCheck);
    if (controlling) expect(words).toContain(controlling.title);
  });
});
