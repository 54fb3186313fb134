/**
 * The access matrix: every route handler (each exported method of app/**\/route.ts) and every server
 * action (each exported function of app/**\/actions.ts), called in-process as each demo role of the
 * owning organisation, a member of the other organisation, and nobody.
 *
 * ADDING A ROUTE OR ACTION: add one row to MATRIX below (keep rows grouped by area). The first test
 * fails while any route or action is missing from it. Give a row a `setup(who)` when the call needs
 * data (create it for the demo organisation, fresh for each call) or changes something; it returns
 * `{ args }` for an action or `{ params, body, search }` for a route. Outcomes are explained at
 * `Expected` in tests/support/access-matrix.ts; `only({ admin: 200 })` means admin succeeds, other
 * demo members get 403, the other organisation 404, nobody 401 (pass `{ nobody: SIGN_IN }` for actions).
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { db } from "@/db/client";
import { DEMO_PASSWORD } from "@/db/seeds/01_demo_accounts";
import crypto from "node:crypto";
import { putObject } from "@/app/_lib/storage";
import { freshApproved, freshAsBuilt, freshInReview, makeDesign, userId as reviewUserId } from "../support/review-fixtures";
import { CALLERS, SIGN_IN, WHO, callAs, discoverEndpoints, everyone, formArgs, only, type MatrixRow } from "../support/access-matrix";
import { freshInvitation, freshMember, freshReset, freshSignUp, uniqueEmail, userId } from "../support/accounts";
import { DEMO_CARD_ID, DEMO_PROJECT_ID } from "@/db/seeds/02_demo_projects";
import { defaultDesignInput } from "@/engine";
import { demoInput, freshDesign, freshFile, freshProject } from "../support/project-fixtures";
import { ENGAGED_MATRIX, OUTSIDE, engagementRows, setUpOutsideCast } from "../support/engagement-matrix";

/** Members of the owning organisation who may read projects, designs, revisions and uploads. */
const READERS = (status: 200) => ({ admin: status, designer: status, engineer: status, installer: status } as const);

const MEMBERS = { admin: 200, designer: 200, engineer: 200, installer: 200, other: 200, nobody: 401, engaged: 200, revoked: 200, unengaged: 200 } as const;

const MATRIX: MatrixRow[] = [
  // ── foundation ───────────────────────────────────────────────────────────────────────────────
  { file: "app/api/health/route.ts", name: "GET", expect: everyone(200) },

  // ── sessions (issue 4) ───────────────────────────────────────────────────────────────────────
  { file: "app/api/session/route.ts", name: "GET", expect: MEMBERS },
  {
    file: "app/api/session/route.ts", name: "POST", expect: everyone(200),
    setup: async () => ({ body: { email: CALLERS.installer, password: DEMO_PASSWORD } }),
  },
  { file: "app/api/session/route.ts", name: "DELETE", expect: everyone(200) },
  {
    // Signs in the demo installer, whose home is the field specs (components/ui/role-navigation.ts).
    file: "app/(auth)/login/actions.ts", name: "signInAction", expect: everyone("→/field"),
    setup: async () => ({ args: formArgs({ email: CALLERS.installer, password: DEMO_PASSWORD, next: "" }) }),
  },
  { file: "app/(auth)/login/actions.ts", name: "signOutAction", expect: everyone(SIGN_IN), setup: async () => ({ args: [] }) },

  // ── accounts (issue 4): public flows, the token or the form is the permission ────────────────
  {
    // Step 1 answers the same for every address (hardening finding 11); the e-mailed link finishes it.
    file: "app/(auth)/signup/actions.ts", name: "signUpAction", expect: everyone(200),
    setup: async () => ({ args: formArgs({ organisationName: "Matrix Test Co.", name: "Mat Rix", email: uniqueEmail("signup"), password: "matrix-password-1" }) }),
  },
  {
    file: "app/(auth)/signup/actions.ts", name: "confirmSignUpAction", expect: everyone("→/admin/members"),
    setup: async () => ({ args: formArgs({ token: (await freshSignUp()).token }) }),
  },
  {
    file: "app/(auth)/invite/[token]/actions.ts", name: "acceptInvitationAction", expect: everyone("→/projects"),
    setup: async () => ({ args: formArgs({ token: (await freshInvitation()).token, name: "New Person", password: "invitee-password-1" }) }),
  },
  {
    file: "app/(auth)/reset/actions.ts", name: "requestPasswordResetAction", expect: everyone(200),
    setup: async () => ({ args: formArgs({ email: (await freshMember()).email }) }),
  },
  {
    file: "app/(auth)/reset/[token]/actions.ts", name: "setNewPasswordAction", expect: everyone("→/projects"),
    setup: async () => ({ args: formArgs({ token: await freshReset((await freshMember()).userId), password: "brand-new-password" }) }),
  },

  // ── members admin (issue 4): the demo organisation's members; the other organisation's admin gets 404 ──
  {
    // Invites go to the caller's own organisation, so the other organisation's admin may invite too.
    file: "app/(workspace)/admin/members/actions.ts", name: "inviteMemberAction", expect: only({ admin: 200, other: 200 }, { nobody: SIGN_IN }),
    setup: async () => ({ args: formArgs({ email: uniqueEmail("invite"), roles: ["installer"] }) }),
  },
  {
    file: "app/(workspace)/admin/members/actions.ts", name: "changeRolesAction", expect: only({ admin: 200 }, { nobody: SIGN_IN }),
    setup: async () => ({ args: formArgs({ membershipId: (await freshMember()).membershipId, roles: ["designer", "installer"] }) }),
  },
  {
    file: "app/(workspace)/admin/members/actions.ts", name: "deactivateMemberAction", expect: only({ admin: 200 }, { nobody: SIGN_IN }),
    setup: async () => ({ args: formArgs({ membershipId: (await freshMember()).membershipId }) }),
  },
  {
    file: "app/(workspace)/admin/members/actions.ts", name: "reactivateMemberAction", expect: only({ admin: 200 }, { nobody: SIGN_IN }),
    setup: async () => ({ args: formArgs({ membershipId: (await freshMember({ deactivated: true })).membershipId }) }),
  },
  {
    file: "app/(workspace)/admin/members/actions.ts", name: "revokeInvitationAction", expect: only({ admin: 200 }, { nobody: SIGN_IN }),
    setup: async () => ({ args: formArgs({ invitationId: (await freshInvitation()).id }) }),
  },
  // The members admin's API doors: the same services as the forms above.
  { file: "app/api/members/route.ts", name: "GET", expect: only({ admin: 200, other: 200 }) },
  {
    file: "app/api/invitations/route.ts", name: "POST", expect: only({ admin: 201, other: 201 }),
    setup: async () => ({ body: { email: uniqueEmail("invite-api"), roles: ["installer"] } }),
  },
  {
    file: "app/api/invitations/[invitationId]/route.ts", name: "DELETE", expect: only({ admin: 200 }),
    setup: async () => ({ params: { invitationId: (await freshInvitation()).id } }),
  },
  {
    file: "app/api/members/[membershipId]/route.ts", name: "PATCH", expect: only({ admin: 200 }),
    setup: async () => ({ params: { membershipId: (await freshMember()).membershipId }, body: { roles: ["designer", "installer"] } }),
  },

  // ── engineer licences (issue 4): each engineer's own; nobody else's to touch ─────────────────
  {
    file: "app/(workspace)/account/actions.ts", name: "saveLicenceAction", expect: only({ engineer: 200 }, { other: 403, nobody: SIGN_IN, outside: 200 }),
    setup: async () => ({ args: formArgs({ state: "WY", licenceNumber: "PE-MATRIX-1", expiresOn: "2031-06-30" }) }),
  },
  {
    file: "app/(workspace)/account/actions.ts", name: "removeLicenceAction", expect: only({ engineer: 200 }, { other: 403, nobody: SIGN_IN, outside: 200 }),
    setup: async (who) => {
      const engineer = await userId(CALLERS[who === "engaged" || who === "revoked" || who === "unengaged" ? who : "engineer"]!);
      await db("engineer_licences").insert({ user_id: engineer, state: "NM", licence_number: "PE-MATRIX-2", expires_on: "2031-06-30" }).onConflict(["user_id", "state"]).ignore();
      return { args: formArgs({ state: "NM" }) };
    },
  },
  // Hardening: every signed-in person may end all of their own sessions; signed out goes to sign-in.
  { file: "app/(workspace)/account/actions.ts", name: "signOutEverywhereAction", expect: everyone(SIGN_IN), setup: async () => ({ args: [] }) },

  // ── projects, criteria cards, designs, revisions, uploads (issue 5) ─────────────────────────────
  { file: "app/api/calc/route.ts", name: "POST", expect: MEMBERS, setup: async () => ({ body: defaultDesignInput }) },
  { file: "app/api/projects/route.ts", name: "GET", expect: MEMBERS },
  { file: "app/api/projects/route.ts", name: "POST", expect: only({ admin: 201, designer: 201, other: 201 }), setup: async () => ({ body: { name: "Matrix project", state: "CO" } }) },
  { file: "app/api/projects/[projectId]/route.ts", name: "GET", expect: only(READERS(200)), setup: async () => ({ params: { projectId: DEMO_PROJECT_ID } }) },
  { file: "app/api/projects/[projectId]/route.ts", name: "PATCH", expect: only({ admin: 200, designer: 200 }), setup: async () => ({ params: { projectId: await freshProject() }, body: { notes: "patched by the matrix" } }) },
  { file: "app/api/projects/[projectId]/designs/route.ts", name: "GET", expect: only(READERS(200)), setup: async () => ({ params: { projectId: DEMO_PROJECT_ID } }) },
  { file: "app/api/projects/[projectId]/designs/route.ts", name: "POST", expect: only({ admin: 201, designer: 201 }), setup: async () => ({ params: { projectId: await freshProject() }, body: { name: "Matrix design" } }) },
  { file: "app/api/designs/[designId]/route.ts", name: "GET", expect: only(READERS(200)), setup: async () => ({ params: { designId: (await freshDesign()).designId } }) },
  {
    file: "app/api/designs/[designId]/revisions/route.ts", name: "POST", expect: only({ admin: 201, designer: 201 }),
    setup: async () => {
      const d = await freshDesign();
      return { params: { designId: d.designId }, body: { baseRevisionId: d.revisionId, input: demoInput(), note: "matrix" } };
    },
  },
  { file: "app/api/revisions/[revisionId]/route.ts", name: "GET", expect: only(READERS(200)), setup: async () => ({ params: { revisionId: (await freshDesign()).revisionId } }) },
  { file: "app/api/projects/[projectId]/files/route.ts", name: "GET", expect: only(READERS(200)), setup: async () => ({ params: { projectId: DEMO_PROJECT_ID } }) },
  // A JSON body is not an upload: designers get past the access checks to the 422; nothing is stored.
  { file: "app/api/projects/[projectId]/files/route.ts", name: "POST", expect: only({ admin: 422, designer: 422 }), setup: async () => ({ params: { projectId: await freshProject() }, body: { file: "not multipart" } }) },
  { file: "app/api/projects/[projectId]/files/[fileId]/route.ts", name: "GET", expect: only(READERS(200)), setup: async () => ({ params: await freshFile() }) },
  // Actions are called with an empty name so the outcome is the access decision (422 = allowed, refused by validation), with no side effects.
  { file: "app/(workspace)/projects/actions.ts", name: "createProjectAction", expect: only({ admin: 422, designer: 422, other: 422 }, { nobody: SIGN_IN }), setup: async () => ({ args: formArgs({ name: "", state: "CO" }) }) },
  { file: "app/(workspace)/projects/actions.ts", name: "updateProjectAction", expect: only({ admin: 422, designer: 422 }, { nobody: SIGN_IN }), setup: async () => ({ args: formArgs({ projectId: await freshProject(), name: "", state: "CO" }) }) },
  { file: "app/(workspace)/projects/[projectId]/actions.ts", name: "createDesignAction", expect: only({ admin: 422, designer: 422 }, { nobody: SIGN_IN }), setup: async () => ({ args: formArgs({ projectId: await freshProject(), name: "" }) }) },
  { file: "app/(workspace)/criteria/actions.ts", name: "saveCriteriaCardAction", expect: only({ admin: 422, designer: 422 }, { nobody: SIGN_IN }), setup: async () => ({ args: formArgs({ cardId: DEMO_CARD_ID, jurisdiction: "", state: "CO" }) }) },
  // ── review, field spec, as-built, report (issue 6) ─────────────────────────────────────────────
  { file: "app/api/revisions/[revisionId]/submit/route.ts", name: "POST", expect: only({ designer: 200 }), setup: async () => ({ params: { revisionId: (await makeDesign()).revisionId }, body: { engineerId: await reviewUserId(CALLERS.engineer) } }) },
  { file: "app/api/revisions/[revisionId]/review/route.ts", name: "POST", expect: only({ engineer: 200 }), setup: async () => ({ params: { revisionId: (await freshInReview()).revisionId }, body: { decision: "approve", password: DEMO_PASSWORD } }) },
  { file: "app/api/revisions/[revisionId]/report.pdf/route.ts", name: "GET", expect: only({ admin: 200, designer: 200, engineer: 200, installer: 200 }), setup: async () => ({ params: { revisionId: (await makeDesign()).revisionId } }) },
  {
    file: "app/api/revisions/[revisionId]/letter/route.ts", name: "GET", expect: only({ admin: 200, designer: 200, engineer: 200, installer: 200 }),
    setup: async () => {
      const letterKey = `matrix/letter-${crypto.randomUUID()}`;
      await putObject(letterKey, new TextEncoder().encode("%PDF-1.4 matrix letter"), "application/pdf");
      return { params: { revisionId: (await freshApproved({ letterKey })).revisionId } };
    },
  },
  {
    file: "app/api/as-built/[entryId]/photos/[index]/route.ts", name: "GET", expect: only({ admin: 200, designer: 200, engineer: 200, installer: 200 }),
    setup: async () => {
      const key = `matrix/photo-${crypto.randomUUID()}`;
      await putObject(key, new Uint8Array([0x89, 0x50, 0x4e, 0x47]), "image/png");
      return { params: { entryId: (await freshAsBuilt({ photoKeys: [key] })).entryId, index: "0" } };
    },
  },
  {
    file: "app/(workspace)/reviews/[revisionId]/actions.ts", name: "submitForReviewAction", expect: only({ designer: 200 }, { nobody: SIGN_IN }),
    setup: async () => ({ args: formArgs({ revisionId: (await makeDesign()).revisionId, engineerId: await reviewUserId(CALLERS.engineer) }) }),
  },
  {
    file: "app/(workspace)/reviews/[revisionId]/actions.ts", name: "decideReviewAction", expect: only({ engineer: 200 }, { nobody: SIGN_IN }),
    setup: async () => ({ args: formArgs({ revisionId: (await freshInReview()).revisionId, decision: "approve", password: DEMO_PASSWORD }) }),
  },
  {
    file: "app/(workspace)/reviews/[revisionId]/actions.ts", name: "clearHoldAction", expect: only({ engineer: 200 }, { nobody: SIGN_IN }),
    setup: async () => ({ args: formArgs({ holdId: (await freshAsBuilt({ hold: true })).holdId!, note: "Cleared by the access matrix.", confirm: "yes" }) }),
  },
  {
    file: "app/(workspace)/field/[revisionId]/actions.ts", name: "recordAsBuiltAction", expect: only({ installer: 200, engineer: 200 }, { nobody: SIGN_IN }),
    setup: async () => ({ args: formArgs({ revisionId: (await freshApproved()).revisionId, postId: "P1", measuredDiameterIn: "30", measuredDepthIn: "100", groundFound: "as_expected" }) }),
  },
  {
    file: "app/(workspace)/field/[revisionId]/actions.ts", name: "tickChecklistAction", expect: only({ installer: 200, engineer: 200 }, { nobody: SIGN_IN }),
    setup: async () => ({ args: formArgs({ revisionId: (await freshApproved()).revisionId, itemKey: "utility-locate", ticked: "true" }) }),
  },
  // ── outside reviewing engineers (issue 14); the contractor's projects here are ones they are not engaged on ──
  ...engagementRows,
];

beforeAll(setUpOutsideCast);

afterAll(async () => {
  await db("sign_in_failures").delete();
});

describe("access matrix", () => {
  it("lists every route handler and server action in app/ (add a row to MATRIX for a new one)", async () => {
    const found = await discoverEndpoints();
    const key = (e: { file: string; name: string }) => `${e.file} ${e.name}`;
    const listed = new Set(MATRIX.map(key));
    const missing = found.map(key).filter((k) => !listed.has(k));
    expect(missing, "routes/actions with no row in MATRIX").toEqual([]);
    const stale = MATRIX.map(key).filter((k) => !found.some((f) => key(f) === k));
    expect(stale, "rows in MATRIX for routes/actions that no longer exist").toEqual([]);
    expect(new Set(MATRIX.map(key)).size, "each route/action is listed once").toBe(MATRIX.length);
  });

  for (const row of MATRIX) {
    describe(`${row.file} ${row.name}`, () => {
      for (const who of WHO) {
        it(`as ${who} → ${row.expect[who]}`, async () => {
          const { outcome, detail } = await callAs(row, who);
          expect(outcome, `${row.file} ${row.name} as ${who}: ${detail}`).toBe(row.expect[who]);
        });
      }
    });
  }
});

// The same routes and actions aimed at the project the outside engineer is engaged on (for `revoked`, the
// project their engagement on was revoked): reads and their own review work open, everything else 404.
describe("access matrix: targets on the engaged project", () => {
  for (const row of ENGAGED_MATRIX) {
    describe(`${row.file} ${row.name}`, () => {
      for (const who of OUTSIDE) {
        it(`as ${who} → ${row.expect[who]}`, async () => {
          const { outcome, detail } = await callAs(row, who);
          expect(outcome, `${row.file} ${row.name} as ${who} (engaged target): ${detail}`).toBe(row.expect[who]);
        });
      }
    });
  }
});
