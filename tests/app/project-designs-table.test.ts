/**
 * Issue 17, item 12: the project's design table shows the approved revision and its standing
 * (approved, on hold) beside the latest draft, so an approved revision never hides behind a newer one.
 */
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it, vi } from "vitest";
import ProjectPage from "@/app/(workspace)/projects/[projectId]/page";
import { db } from "@/db/client";
import { twoPostDesignInput } from "@/engine";
import { actAs } from "../support/next-context";
import { DESIGNER, addRevision, freshApproved, freshAsBuilt, freshInReview } from "../support/review-fixtures";

// The table's client hooks need the app router, which a server render has not mounted: give them a fixed URL.
vi.mock("next/navigation", async (original) => ({
  ...(await original<typeof import("next/navigation")>()),
  useRouter: () => ({ push() {}, replace() {}, refresh() {}, prefetch() {}, back() {}, forward() {} }),
  usePathname: () => "/projects",
  useSearchParams: () => new URLSearchParams(),
}));

const text = (h: string) => h.replace(/<[^>]*>/g, " ").replace(/\s+/g, " ");
async function projectPage(designId: string) {
  const { project_id: projectId } = await db("designs").where({ id: designId }).first("project_id");
  await actAs(DESIGNER);
  return renderToStaticMarkup(await ProjectPage({ params: Promise.resolve({ projectId }), searchParams: Promise.resolve({}) }));
}

describe("project design table", () => {
  it("shows the approved revision 1 beside a newer draft revision 2, linked to its review", async () => {
    const d = await freshApproved();
    await addRevision(d.designId, { ...twoPostDesignInput, site: { ...twoPostDesignInput.site, windSpeedMph: 120 } });
    const page = await projectPage(d.designId);
    expect(text(page)).toMatch(/Draft\s+Rev 2\s+Rev 1\s+Approved/);
    expect(page).toContain(`href="/reviews/${d.revisionId}"`);
  });

  it("shows the approved revision as on hold while a hold on the design is open", async () => {
    const d = await freshAsBuilt({ hold: true });
    await addRevision(d.designId, twoPostDesignInput);
    expect(text(await projectPage(d.designId))).toMatch(/Rev 1\s+Approved\s+On hold/);
  });

  it("says none yet when no revision was approved", async () => {
    // A design whose only revision is waiting for review (approved_revision_id is kept by triggers
    // and cannot be cleared by hand, migration 20261204400000).
    const d = await freshInReview();
    expect(text(await projectPage(d.designId))).toMatch(/Rev 1\s+None yet/);
  });
});
