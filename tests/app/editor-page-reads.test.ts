/**
 * The design editor page reads what it shows beside its access checks (issue 16, the server's
 * answer before the 3D scene can start): a ceiling on the SQL statements one editor page runs, and
 * on how many times the page waits for the database with nothing else in flight (reads in a row,
 * counted by a query listener, not timed; the layout's own read of the member is the same cached one). The checks it runs in parallel still refuse as before:
 * a design of another project, a revision of another design (`?revision=`, `?from=`), another
 * organisation's design, an id that is not one, an outside engineer not engaged; an engaged one reads.
 */
import crypto from "node:crypto";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it, vi } from "vitest";
import DesignPage from "@/app/(workspace)/projects/[projectId]/designs/[designId]/page";
import { db } from "@/db/client";
import { OTHER_PROJECT_ID } from "@/db/seeds/02_demo_projects";
import { twoPostDesignInput } from "@/engine";
import { actAs, outcomeOf } from "../support/next-context";
import { engage, freshOutsideEngineer } from "../support/engagement-fixtures";
import { DESIGNER, OUTSIDER, addRevision, freshApproved, makeDesign } from "../support/review-fixtures";

// The editor's client hooks need the app router, which a server render has not mounted.
vi.mock("next/navigation", async (original) => ({
  ...(await original<typeof import("next/navigation")>()),
  useRouter: () => ({ push() {}, replace() {}, refresh() {}, prefetch() {}, back() {}, forward() {} }),
  usePathname: () => "/projects",
  useSearchParams: () => new URLSearchParams(),
}));

type Search = Record<string, string>;
const open = (projectId: string, designId: string, search: Search = {}) =>
  outcomeOf(() => DesignPage({ params: Promise.resolve({ projectId, designId }), searchParams: Promise.resolve(search) }));

/**
 * Every statement the page runs, and the number of waits: a statement sent while no other is in
 * flight starts a new wait (statements sent together, or while another runs, share it).
 */
async function counted<T>(run: () => Promise<T>): Promise<{ result: T; statements: string[]; waits: number }> {
  const statements: string[] = [];
  const inFlight = new Set<string>();
  let waits = 0;
  const sent = (q: { __knexQueryUid: string; sql: string }) => {
    if (inFlight.size === 0) waits += 1;
    inFlight.add(q.__knexQueryUid);
    statements.push(q.sql);
  };
  const done = (_r: unknown, q: { __knexQueryUid: string }) => inFlight.delete(q.__knexQueryUid);
  const failed = (_e: unknown, q: { __knexQueryUid: string }) => inFlight.delete(q.__knexQueryUid);
  db.on("query", sent).on("query-response", done).on("query-error", failed);
  try {
    return { result: await run(), statements, waits };
  } finally {
    db.off("query", sent).off("query-response", done).off("query-error", failed);
  }
}

describe("the design editor's reads", () => {
  it("reads a revision's page in at most 10 statements and 4 waits on the database, and shows what it read", async () => {
    // An approved revision 1 with a newer draft: the page reads the review's pinned comments and the
    // review bar looks for a newer approval.
    const d = await freshApproved();
    await addRevision(d.designId, { ...twoPostDesignInput, site: { ...twoPostDesignInput.site, windSpeedMph: 120 } }, DESIGNER);
    const { project_id: projectId } = await db("designs").where({ id: d.designId }).first("project_id");
    await actAs(DESIGNER);
    // Once to open the pool's connections, as a running server has them (a read that waits for a
    // new connection would look like a read in a row).
    await open(projectId, d.designId, { revision: d.revisionId });
    const { result, statements, waits } = await counted(() => open(projectId, d.designId, { revision: d.revisionId }));
    expect(result.kind).toBe("value");
    // The page's own statements through the query builder (the sign-in check is one prepared
    // statement outside it): project, design, latest and picked revision (4); the latest decision
    // and its pinned comments (2); the revisions page and its count (2); the review bar's holds and
    // newer approval (2). Before, the design was read a second time for the pinned comments.
    expect(statements.length, statements.join("\n")).toBeLessThanOrEqual(10);
    // Reads that depend on each other: everything at once; the card, the latest decision and the
    // review bar's reads once the project and the revision shown are known; the decision's
    // comments. That is 3 waits at most, one more allowed for a pooled connection handed out a
    // moment late (a read sent after its neighbour came back counts as a new wait). Before: 6.
    expect(waits, statements.join("\n")).toBeLessThanOrEqual(4);
    const html = renderToStaticMarkup((result as { value: React.ReactElement }).value);
    expect(html).toContain("Revision 1 of 2");
    expect(html).toContain("an older revision");
  });
});

describe("the design editor's checks, read in parallel", () => {
  it("answers 404 for a design of another project, a revision of another design, another organisation's design or a malformed id", async () => {
    const a = await makeDesign();
    const b = await makeDesign();
    const bOlder = await addRevision(b.designId, twoPostDesignInput);
    await actAs(DESIGNER);
    expect(await open(a.projectId, a.designId)).toMatchObject({ kind: "value" });
    // The design exists and is the organisation's, but under another project's address.
    expect(await open(b.projectId, a.designId)).toEqual({ kind: "status", status: 404 });
    // A revision of design b opened through design a, to read or to edit from.
    expect(await open(a.projectId, a.designId, { revision: bOlder })).toEqual({ kind: "status", status: 404 });
    expect(await open(a.projectId, a.designId, { from: b.revisionId })).toEqual({ kind: "status", status: 404 });
    expect(await open(a.projectId, a.designId, { revision: crypto.randomUUID() })).toEqual({ kind: "status", status: 404 });
    expect(await open(a.projectId, "not-an-id")).toEqual({ kind: "status", status: 404 });
    expect(await open(a.projectId, crypto.randomUUID())).toEqual({ kind: "status", status: 404 });
    // Another organisation's design, at its own project's address.
    const theirs = await db("designs").where({ project_id: OTHER_PROJECT_ID }).first("id");
    expect(await open(OTHER_PROJECT_ID, theirs.id)).toEqual({ kind: "status", status: 404 });
    await actAs(OUTSIDER);
    expect(await open(OTHER_PROJECT_ID, theirs.id)).toMatchObject({ kind: "value" });
    expect(await open(a.projectId, a.designId)).toEqual({ kind: "status", status: 404 });
    // Signed out: to the sign-in page, coming back after.
    await actAs(null);
    expect(await open(a.projectId, a.designId)).toEqual({ kind: "redirect", location: `/login?next=${encodeURIComponent(`/projects/${a.projectId}/designs/${a.designId}`)}` });
  });

  it("lets an outside engineer read only while engaged on the project, read-only", async () => {
    const a = await makeDesign();
    const engineer = await freshOutsideEngineer();
    await actAs(engineer.email);
    expect(await open(a.projectId, a.designId)).toEqual({ kind: "status", status: 404 });
    await engage(a.projectId, engineer, "accepted");
    const page = await open(a.projectId, a.designId);
    expect(page.kind).toBe("value");
    const html = renderToStaticMarkup((page as { value: React.ReactElement }).value);
    expect(html).toContain("Array A");
    // Another project of the same organisation stays closed to them.
    const other = await makeDesign();
    expect(await open(other.projectId, other.designId)).toEqual({ kind: "status", status: 404 });
  });
});
