/**
 * The access matrix's part for outside reviewing engineers (issue 14): rows for the engagement
 * routes and actions (all nine callers), and ENGAGED_MATRIX, which aims the project routes at a
 * project the caller is engaged on (`engaged`), was engaged on until it was revoked (`revoked`), or
 * never was (`unengaged`). Kept here so tests/app/access-matrix.test.ts only gains a few lines.
 */
import crypto from "node:crypto";
import { putObject } from "@/app/_lib/storage";
import { db } from "@/db/client";
import { DEMO_ORG_ID, DEMO_PASSWORD } from "@/db/seeds/01_demo_accounts";
import { DEMO_PROJECT_ID } from "@/db/seeds/02_demo_projects";
import { CALLERS, SIGN_IN, everyone, formArgs, only, type Expected, type MatrixRow, type Who } from "./access-matrix";
import { uniqueEmail } from "./accounts";
import { engage, engagementWithToken, ensureOutsideCast, idOf } from "./engagement-fixtures";
import { demoInput, freshDesign, freshFile, freshProject } from "./project-fixtures";
import { freshApproved, freshAsBuilt, makeDesign } from "./review-fixtures";

export const OUTSIDE = ["engaged", "revoked", "unengaged"] as const satisfies readonly Who[];
type Outside = (typeof OUTSIDE)[number];

export async function setUpOutsideCast(): Promise<void> {
  await ensureOutsideCast();
  // `revoked` was engaged on the demo contractor's main project, then revoked.
  await engage(DEMO_PROJECT_ID, { email: CALLERS.revoked, userId: await idOf(CALLERS.revoked) }, "revoked");
}

/** Engages the caller on the project as the column says: accepted, revoked, or not at all. */
async function engageFor(who: Who, projectId: string): Promise<void> {
  if (who === "engaged" || who === "revoked") {
    await engage(projectId, { email: CALLERS[who], userId: await idOf(CALLERS[who]) }, who === "engaged" ? "accepted" : "revoked");
  }
}

const projectOfDesign = async (designId: string): Promise<string> => (await db("designs").where({ id: designId }).first("project_id")).project_id;

/** A revision in review, submitted to the caller, on a project engaged as the column says. */
async function inReviewFor(who: Who): Promise<string> {
  const d = await makeDesign();
  await engageFor(who, d.projectId);
  await db("revisions").where({ id: d.revisionId }).update({ status: "in_review" });
  const submittedBy = (await db("users").where({ email: CALLERS.designer }).first("id")).id;
  await db("reviews").insert({ revision_id: d.revisionId, organisation_id: DEMO_ORG_ID, engineer_id: await idOf(CALLERS[who as Outside] ?? CALLERS.engineer), submitted_by: submittedBy });
  return d.revisionId;
}

/** An invited engagement addressed to the demo outside engineer: only they may answer it. */
async function invitedToEngaged(): Promise<string> {
  return engage((await freshDesign()).projectId, { email: CALLERS.engaged, userId: await idOf(CALLERS.engaged) }, "invited");
}

export const engagementRows: MatrixRow[] = [
  { file: "app/api/projects/[projectId]/engagements/route.ts", name: "POST", expect: only({ admin: 201, designer: 201 }), setup: async () => ({ params: { projectId: await freshProject() }, body: { email: uniqueEmail("engage") } }) },
  { file: "app/api/projects/[projectId]/engagements/route.ts", name: "GET", expect: only({ admin: 200, designer: 200, engineer: 200, installer: 200 }), setup: async () => ({ params: { projectId: DEMO_PROJECT_ID } }) },
  {
    file: "app/api/projects/[projectId]/engagements/[engagementId]/route.ts", name: "DELETE", expect: only({ admin: 200, designer: 200 }),
    setup: async () => {
      const projectId = await freshProject();
      return { params: { projectId, engagementId: await engage(projectId, { email: uniqueEmail("revoke"), userId: "" }, "invited") } };
    },
  },
  { file: "app/api/engagements/route.ts", name: "GET", expect: { ...everyone(200), nobody: 401 } },
  { file: "app/api/engagements/[engagementId]/accept/route.ts", name: "POST", expect: only({ engaged: 200 }, { member: 404 }), setup: async () => ({ params: { engagementId: await invitedToEngaged() } }) },
  { file: "app/api/engagements/[engagementId]/decline/route.ts", name: "POST", expect: only({ engaged: 200 }, { member: 404 }), setup: async () => ({ params: { engagementId: await invitedToEngaged() } }) },
  {
    file: "app/(workspace)/projects/[projectId]/actions.ts", name: "engageEngineerAction", expect: only({ admin: 200, designer: 200 }, { nobody: SIGN_IN }),
    setup: async () => ({ args: formArgs({ projectId: await freshProject(), email: uniqueEmail("engage-action") }) }),
  },
  {
    file: "app/(workspace)/projects/[projectId]/actions.ts", name: "revokeEngagementAction", expect: only({ admin: 200, designer: 200 }, { nobody: SIGN_IN }),
    setup: async () => {
      const projectId = await freshProject();
      return { args: formArgs({ projectId, engagementId: await engage(projectId, { email: uniqueEmail("revoke-action"), userId: "" }, "invited") }) };
    },
  },
  {
    // Declining keeps the call free of a redirect; only the addressee gets past the 404.
    file: "app/(workspace)/queue/actions.ts", name: "answerEngagementAction", expect: only({ engaged: 200 }, { member: 404, nobody: SIGN_IN }),
    setup: async () => ({ args: formArgs({ engagementId: await invitedToEngaged(), answer: "decline", returnTo: "/queue" }) }),
  },
  {
    // Public: the link's token is the permission; a new engineer lands on their queue.
    file: "app/(auth)/engagements/[token]/actions.ts", name: "engineerSignUpAction", expect: everyone("→/queue"),
    setup: async () => {
      const { token } = await engagementWithToken(await freshProject(), uniqueEmail("engineer-signup"));
      return { args: formArgs({ token, kind: "firm", firmName: "Matrix Review Firm (invented)", name: "Mat Rix, P.E.", password: "matrix-password-1", state: "CO", licenceNumber: "PE-MATRIX-9", expiresOn: "2031-06-30" }) };
    },
  },
];

/** A row of ENGAGED_MATRIX: outcomes for the three outside engineers only. */
export interface EngagedRow extends Omit<MatrixRow, "expect"> {
  expect: Record<Outside, Expected>;
}

/** Open to the engaged engineer (`ok`), 404 once revoked and when never engaged. */
const open = (ok: Expected): Record<Outside, Expected> => ({ engaged: ok, revoked: 404, unengaged: 404 });
const closed = (nobodyCase: Expected = 404): Record<Outside, Expected> => ({ engaged: nobodyCase, revoked: nobodyCase, unengaged: nobodyCase });

export const ENGAGED_MATRIX: EngagedRow[] = [
  // Reads of the engaged project.
  { file: "app/api/projects/[projectId]/route.ts", name: "GET", expect: open(200), setup: async (who) => { const projectId = await freshProject(); await engageFor(who, projectId); return { params: { projectId } }; } },
  { file: "app/api/projects/[projectId]/designs/route.ts", name: "GET", expect: open(200), setup: async (who) => { const { projectId } = await freshDesign(); await engageFor(who, projectId); return { params: { projectId } }; } },
  { file: "app/api/designs/[designId]/route.ts", name: "GET", expect: open(200), setup: async (who) => { const d = await freshDesign(); await engageFor(who, d.projectId); return { params: { designId: d.designId } }; } },
  { file: "app/api/revisions/[revisionId]/route.ts", name: "GET", expect: open(200), setup: async (who) => { const d = await freshDesign(); await engageFor(who, d.projectId); return { params: { revisionId: d.revisionId } }; } },
  { file: "app/api/projects/[projectId]/files/route.ts", name: "GET", expect: open(200), setup: async (who) => { const f = await freshFile(); await engageFor(who, f.projectId); return { params: { projectId: f.projectId } }; } },
  { file: "app/api/projects/[projectId]/files/[fileId]/route.ts", name: "GET", expect: open(200), setup: async (who) => { const f = await freshFile(); await engageFor(who, f.projectId); return { params: f }; } },
  { file: "app/api/revisions/[revisionId]/report.pdf/route.ts", name: "GET", expect: open(200), setup: async (who) => { const d = await makeDesign(); await engageFor(who, d.projectId); return { params: { revisionId: d.revisionId } }; } },
  {
    file: "app/api/revisions/[revisionId]/letter/route.ts", name: "GET", expect: open(200),
    setup: async (who) => {
      const letterKey = `matrix/letter-${crypto.randomUUID()}`;
      await putObject(letterKey, new TextEncoder().encode("%PDF-1.4 matrix letter"), "application/pdf");
      const d = await freshApproved({ letterKey });
      await engageFor(who, await projectOfDesign(d.designId));
      return { params: { revisionId: d.revisionId } };
    },
  },
  {
    file: "app/api/as-built/[entryId]/photos/[index]/route.ts", name: "GET", expect: open(200),
    setup: async (who) => {
      const key = `matrix/photo-${crypto.randomUUID()}`;
      await putObject(key, new Uint8Array([0x89, 0x50, 0x4e, 0x47]), "image/png");
      const a = await freshAsBuilt({ photoKeys: [key] });
      await engageFor(who, await projectOfDesign(a.designId));
      return { params: { entryId: a.entryId, index: "0" } };
    },
  },
  // Their own review work.
  { file: "app/api/revisions/[revisionId]/review/route.ts", name: "POST", expect: open(200), setup: async (who) => ({ params: { revisionId: await inReviewFor(who) }, body: { decision: "approve", password: DEMO_PASSWORD } }) },
  { file: "app/(workspace)/reviews/[revisionId]/actions.ts", name: "decideReviewAction", expect: open(200), setup: async (who) => ({ args: formArgs({ revisionId: await inReviewFor(who), decision: "approve", password: DEMO_PASSWORD }) }) },
  {
    file: "app/(workspace)/reviews/[revisionId]/actions.ts", name: "clearHoldAction", expect: open(200),
    setup: async (who) => {
      const a = await freshAsBuilt({ hold: true });
      await engageFor(who, await projectOfDesign(a.designId));
      return { args: formArgs({ holdId: a.holdId!, note: "Cleared by the outside engineer in the matrix.", confirm: "yes" }) };
    },
  },
  // Everything else on the engaged project stays the contractor's: 404 even while engaged.
  { file: "app/api/projects/[projectId]/route.ts", name: "PATCH", expect: closed(), setup: async (who) => { const projectId = await freshProject(); await engageFor(who, projectId); return { params: { projectId }, body: { notes: "outside" } }; } },
  { file: "app/api/projects/[projectId]/designs/route.ts", name: "POST", expect: closed(), setup: async (who) => { const projectId = await freshProject(); await engageFor(who, projectId); return { params: { projectId }, body: { name: "Outside design" } }; } },
  {
    file: "app/api/designs/[designId]/revisions/route.ts", name: "POST", expect: closed(),
    setup: async (who) => { const d = await freshDesign(); await engageFor(who, d.projectId); return { params: { designId: d.designId }, body: { baseRevisionId: d.revisionId, input: demoInput(), note: "outside" } }; },
  },
  { file: "app/api/projects/[projectId]/files/route.ts", name: "POST", expect: closed(), setup: async (who) => { const projectId = await freshProject(); await engageFor(who, projectId); return { params: { projectId }, body: { file: "not multipart" } }; } },
  { file: "app/api/projects/[projectId]/engagements/route.ts", name: "GET", expect: closed(), setup: async (who) => { const projectId = await freshProject(); await engageFor(who, projectId); return { params: { projectId } }; } },
  { file: "app/api/projects/[projectId]/engagements/route.ts", name: "POST", expect: closed(), setup: async (who) => { const projectId = await freshProject(); await engageFor(who, projectId); return { params: { projectId }, body: { email: uniqueEmail("outside-engages") } }; } },
  {
    file: "app/api/revisions/[revisionId]/submit/route.ts", name: "POST", expect: closed(),
    setup: async (who) => { const d = await makeDesign(); await engageFor(who, d.projectId); return { params: { revisionId: d.revisionId }, body: { engineerId: await idOf(CALLERS.engineer) } }; },
  },
  { file: "app/(workspace)/projects/actions.ts", name: "updateProjectAction", expect: closed(), setup: async (who) => { const projectId = await freshProject(); await engageFor(who, projectId); return { args: formArgs({ projectId, name: "", state: "CO" }) }; } },
  { file: "app/(workspace)/projects/[projectId]/actions.ts", name: "createDesignAction", expect: closed(), setup: async (who) => { const projectId = await freshProject(); await engageFor(who, projectId); return { args: formArgs({ projectId, name: "" }) }; } },
  {
    file: "app/(workspace)/reviews/[revisionId]/actions.ts", name: "submitForReviewAction", expect: closed(),
    setup: async (who) => { const d = await makeDesign(); await engageFor(who, d.projectId); return { args: formArgs({ revisionId: d.revisionId, engineerId: await idOf(CALLERS.engineer) }) }; },
  },
  {
    file: "app/(workspace)/field/[revisionId]/actions.ts", name: "recordAsBuiltAction", expect: closed(),
    setup: async (who) => {
      const d = await freshApproved();
      await engageFor(who, await projectOfDesign(d.designId));
      return { args: formArgs({ revisionId: d.revisionId, postId: "P1", measuredDiameterIn: "30", measuredDepthIn: "100", groundFound: "as_expected" }) };
    },
  },
];
