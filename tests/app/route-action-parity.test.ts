/**
 * One use case, two doors: each API route and the server action of the same use case call one
 * service (app/_lib/services), so the same caller sending the same fields gets the same outcome —
 * done, the same invalid fields, the same refusal. One shared table of cases; each case runs
 * once through the route and once through the action, each on fresh data.
 */
import { afterAll, describe, expect, it } from "vitest";
import { createDesignAction } from "@/app/(workspace)/projects/[projectId]/actions";
import { createProjectAction, updateProjectAction } from "@/app/(workspace)/projects/actions";
import { decideReviewAction, submitForReviewAction } from "@/app/(workspace)/reviews/[revisionId]/actions";
import { POST as designsRoute } from "@/app/api/projects/[projectId]/designs/route";
import { PATCH as projectRoute } from "@/app/api/projects/[projectId]/route";
import { POST as projectsRoute } from "@/app/api/projects/route";
import { POST as reviewRoute } from "@/app/api/revisions/[revisionId]/review/route";
import { POST as submitRoute } from "@/app/api/revisions/[revisionId]/submit/route";
import { engageEngineerAction, revokeEngagementAction } from "@/app/(workspace)/projects/[projectId]/actions";
import { answerEngagementAction } from "@/app/(workspace)/queue/actions";
import { POST as acceptRoute } from "@/app/api/engagements/[engagementId]/accept/route";
import { POST as declineRoute } from "@/app/api/engagements/[engagementId]/decline/route";
import { POST as engageRoute } from "@/app/api/projects/[projectId]/engagements/route";
import { DELETE as revokeRoute } from "@/app/api/projects/[projectId]/engagements/[engagementId]/route";
import { changeRolesAction, deactivateMemberAction, inviteMemberAction, revokeInvitationAction } from "@/app/(workspace)/admin/members/actions";
import { DELETE as invitationRoute } from "@/app/api/invitations/[invitationId]/route";
import { POST as invitationsRoute } from "@/app/api/invitations/route";
import { PATCH as memberRoute } from "@/app/api/members/[membershipId]/route";
import { freshInvitation, freshMember, uniqueEmail } from "../support/accounts";
import { engage, freshOutsideEngineer } from "../support/engagement-fixtures";
import { db } from "@/db/client";
import { DEMO_PASSWORD } from "@/db/seeds/01_demo_accounts";
import { DEMO_CARD_ID } from "@/db/seeds/02_demo_projects";
import { toFormData } from "../support/access-matrix";
import { actAs, jsonRequest, outcomeOf, params } from "../support/next-context";
import { DESIGNER, ENGINEER, freshInReview, INSTALLER, makeDesign, OUTSIDER, userId } from "../support/review-fixtures";

const ADMIN = "admin@demo.pierwise.test";
type Fields = Record<string, string | string[] | boolean>;
/** done | invalid:<fields> | forbidden | not-found | signed-out | refused:<message> */
type Outcome = string;

interface UseCase {
  name: string;
  /** Fresh data for one call; returns the id the route takes in its path and the action in its form (or several, by name). */
  setup: () => Promise<string | Record<string, string>>;
  idName: string;
  route: (request: Request, context: { params: Promise<Record<string, string>> }) => Promise<Response>;
  method: string;
  action: (prev: object, form: FormData) => Promise<unknown>;
}

const projectsMade: string[] = [];
/** Fresh data in the demo organisation, removed after the file so other tests' lists stay as they were. */
const made = <T extends { projectId: string }>(d: T): T => (projectsMade.push(d.projectId), d);
const projectIdOf = async () => made(await makeDesign()).projectId;
async function inReviewId(): Promise<string> {
  const d = await freshInReview();
  projectsMade.push((await db("designs").where({ id: d.designId }).first("project_id")).project_id);
  return d.revisionId;
}
const USE_CASES: Record<string, UseCase> = {
  createProject: { name: "create a project", setup: async () => "", idName: "", route: (r) => projectsRoute(r, {}), method: "POST", action: createProjectAction },
  updateProject: { name: "update a project", setup: projectIdOf, idName: "projectId", route: projectRoute as UseCase["route"], method: "PATCH", action: updateProjectAction },
  createDesign: { name: "create a design", setup: projectIdOf, idName: "projectId", route: designsRoute as UseCase["route"], method: "POST", action: createDesignAction },
  submit: { name: "submit for review", setup: async () => made(await makeDesign()).revisionId, idName: "revisionId", route: submitRoute as UseCase["route"], method: "POST", action: submitForReviewAction },
  decide: { name: "decide a review", setup: inReviewId, idName: "revisionId", route: reviewRoute as UseCase["route"], method: "POST", action: decideReviewAction },
  engage: { name: "engage an outside engineer", setup: projectIdOf, idName: "projectId", route: engageRoute as UseCase["route"], method: "POST", action: engageEngineerAction },
  revokeEngagement: { name: "revoke an engagement", setup: engagementIds("accepted"), idName: "", route: revokeRoute as UseCase["route"], method: "DELETE", action: revokeEngagementAction },
  acceptEngagement: { name: "accept an engagement", setup: async () => (await engagementIds("invited")()).engagementId, idName: "engagementId", route: acceptRoute as UseCase["route"], method: "POST", action: answerWith("accept") },
  invite: { name: "invite a member", setup: async () => "", idName: "", route: (r) => invitationsRoute(r, {}), method: "POST", action: inviteMemberAction },
  revokeInvitation: { name: "revoke an invitation", setup: async () => (await freshInvitation()).id, idName: "invitationId", route: invitationRoute as UseCase["route"], method: "DELETE", action: revokeInvitationAction },
  changeRoles: { name: "change a member's roles", setup: async () => (await freshMember()).membershipId, idName: "membershipId", route: memberRoute as UseCase["route"], method: "PATCH", action: changeRolesAction },
  deactivate: { name: "deactivate a member", setup: async () => (await freshMember()).membershipId, idName: "membershipId", route: memberRoute as UseCase["route"], method: "PATCH", action: deactivateMemberAction },
  declineEngagement: { name: "decline an engagement", setup: async () => (await engagementIds("invited")()).engagementId, idName: "engagementId", route: declineRoute as UseCase["route"], method: "POST", action: answerWith("decline") },
};

/** An outside engineer of their own firm, licensed in CO, made once for the engagement cases. */
const PARITY_ENGINEER = "parity-engineer@example.test";
let parityEngineer: Promise<{ email: string; userId: string }> | undefined;
function engagementIds(status: "invited" | "accepted") {
  return async () => {
    parityEngineer ??= freshOutsideEngineer({ email: PARITY_ENGINEER });
    const projectId = await projectIdOf();
    return { projectId, engagementId: await engage(projectId, await parityEngineer, status) };
  };
}
/** The queue's one answer action, with the answer the route's path names. */
function answerWith(answer: "accept" | "decline"): UseCase["action"] {
  return (prev, form) => (form.append("answer", answer), answerEngagementAction(prev, form));
}

let engineerId = "";
let installerId = "";
const CASES: { useCase: keyof typeof USE_CASES; who: string | null; fields: () => Fields; expected: Outcome; id?: string }[] = [
  { useCase: "createProject", who: DESIGNER, fields: () => ({ name: "Parity site", state: "CO", latitude: "39.5" }), expected: "done" },
  // Latitude −90…90° is the definition of latitude [common practice]; state codes are USPS two-letter codes [common practice].
  { useCase: "createProject", who: DESIGNER, fields: () => ({ name: "", state: "Colorado", latitude: "123" }), expected: "invalid:latitude,name,state" },
  { useCase: "createProject", who: INSTALLER, fields: () => ({ name: "Not mine to make", state: "CO" }), expected: "forbidden" },
  { useCase: "createProject", who: OUTSIDER, fields: () => ({ name: "Borrowing a card", state: "CO", criteriaCardId: DEMO_CARD_ID }), expected: "not-found" },
  { useCase: "createProject", who: null, fields: () => ({ name: "Nobody", state: "CO" }), expected: "signed-out" },
  { useCase: "updateProject", who: DESIGNER, fields: () => ({ name: "Renamed site", state: "CO" }), expected: "done" },
  { useCase: "updateProject", who: DESIGNER, fields: () => ({ name: "Renamed site", state: "CO", longitude: "200" }), expected: "invalid:longitude" },
  { useCase: "updateProject", who: INSTALLER, fields: () => ({ name: "Renamed site", state: "CO" }), expected: "forbidden" },
  { useCase: "updateProject", who: OUTSIDER, fields: () => ({ name: "Renamed site", state: "CO" }), expected: "not-found" },
  { useCase: "updateProject", who: DESIGNER, id: "-".repeat(36), fields: () => ({ name: "Renamed site", state: "CO" }), expected: "not-found" },
  { useCase: "createDesign", who: DESIGNER, fields: () => ({ name: "Parity array" }), expected: "done" },
  { useCase: "createDesign", who: DESIGNER, fields: () => ({ name: "" }), expected: "invalid:name" },
  { useCase: "createDesign", who: ENGINEER, fields: () => ({ name: "Parity array" }), expected: "forbidden" },
  { useCase: "createDesign", who: OUTSIDER, fields: () => ({ name: "Parity array" }), expected: "not-found" },
  { useCase: "submit", who: DESIGNER, fields: () => ({ engineerId }), expected: "done" },
  { useCase: "submit", who: DESIGNER, fields: () => ({ engineerId: installerId }), expected: "invalid:engineerId" },
  { useCase: "submit", who: DESIGNER, fields: () => ({ engineerId: "" }), expected: "invalid:engineerId" },
  { useCase: "submit", who: INSTALLER, fields: () => ({ engineerId }), expected: "forbidden" },
  { useCase: "submit", who: OUTSIDER, fields: () => ({ engineerId }), expected: "not-found" },
  { useCase: "decide", who: ENGINEER, fields: () => ({ decision: "approve", password: DEMO_PASSWORD }), expected: "done" },
  { useCase: "decide", who: ENGINEER, fields: () => ({ decision: "maybe" }), expected: "invalid:decision" },
  { useCase: "decide", who: ENGINEER, fields: () => ({ decision: "request-changes" }), expected: "invalid:comments" },
  { useCase: "decide", who: DESIGNER, fields: () => ({ decision: "approve" }), expected: "forbidden" },
  { useCase: "decide", who: OUTSIDER, fields: () => ({ decision: "approve" }), expected: "not-found" },
  { useCase: "engage", who: DESIGNER, fields: () => ({ email: uniqueEmail("parity-outside") }), expected: "done" },
  { useCase: "engage", who: DESIGNER, fields: () => ({ email: "not an address" }), expected: "invalid:email" },
  { useCase: "engage", who: DESIGNER, fields: () => ({ email: INSTALLER }), expected: "invalid:email" },
  { useCase: "engage", who: INSTALLER, fields: () => ({ email: uniqueEmail("parity-outside") }), expected: "forbidden" },
  { useCase: "engage", who: OUTSIDER, fields: () => ({ email: uniqueEmail("parity-outside") }), expected: "not-found" },
  { useCase: "engage", who: null, fields: () => ({ email: uniqueEmail("parity-outside") }), expected: "signed-out" },
  { useCase: "revokeEngagement", who: DESIGNER, fields: () => ({}), expected: "done" },
  { useCase: "revokeEngagement", who: INSTALLER, fields: () => ({}), expected: "forbidden" },
  { useCase: "revokeEngagement", who: OUTSIDER, fields: () => ({}), expected: "not-found" },
  { useCase: "acceptEngagement", who: PARITY_ENGINEER, fields: () => ({}), expected: "done" },
  { useCase: "acceptEngagement", who: DESIGNER, fields: () => ({}), expected: "not-found" },
  { useCase: "acceptEngagement", who: null, fields: () => ({}), expected: "signed-out" },
  { useCase: "declineEngagement", who: PARITY_ENGINEER, fields: () => ({}), expected: "done" },
  { useCase: "declineEngagement", who: OUTSIDER, fields: () => ({}), expected: "not-found" },
  { useCase: "invite", who: ADMIN, fields: () => ({ email: uniqueEmail("parity-invitee"), roles: ["installer"] }), expected: "done" },
  { useCase: "invite", who: ADMIN, fields: () => ({ email: INSTALLER, roles: ["installer"] }), expected: "invalid:email" },
  { useCase: "invite", who: ADMIN, fields: () => ({ email: "nope", roles: ["chief"] }), expected: "invalid:email,roles" },
  { useCase: "invite", who: DESIGNER, fields: () => ({ email: uniqueEmail("parity-invitee"), roles: ["installer"] }), expected: "forbidden" },
  { useCase: "invite", who: null, fields: () => ({ email: uniqueEmail("parity-invitee"), roles: ["installer"] }), expected: "signed-out" },
  { useCase: "revokeInvitation", who: ADMIN, fields: () => ({}), expected: "done" },
  { useCase: "revokeInvitation", who: DESIGNER, fields: () => ({}), expected: "forbidden" },
  { useCase: "revokeInvitation", who: OUTSIDER, fields: () => ({}), expected: "not-found" },
  { useCase: "revokeInvitation", who: ADMIN, id: "-".repeat(36), fields: () => ({}), expected: "not-found" },
  { useCase: "changeRoles", who: ADMIN, fields: () => ({ roles: ["designer", "installer"] }), expected: "done" },
  { useCase: "changeRoles", who: ADMIN, fields: () => ({ roles: ["chief"] }), expected: "invalid:roles" },
  { useCase: "changeRoles", who: DESIGNER, fields: () => ({ roles: ["designer"] }), expected: "forbidden" },
  { useCase: "changeRoles", who: OUTSIDER, fields: () => ({ roles: ["designer"] }), expected: "not-found" },
  { useCase: "changeRoles", who: null, fields: () => ({ roles: ["designer"] }), expected: "signed-out" },
  { useCase: "deactivate", who: ADMIN, fields: () => ({ active: false }), expected: "done" },
  { useCase: "deactivate", who: INSTALLER, fields: () => ({ active: false }), expected: "forbidden" },
  { useCase: "deactivate", who: OUTSIDER, fields: () => ({ active: false }), expected: "not-found" },
];

afterAll(async () => {
  // An approved revision is pinned by the database and keeps its project; the rest go.
  for (const id of projectsMade) await db("projects").where({ id }).delete().catch(() => undefined);
});

/** The ids a call names in its path (route) or form (action). */
const idsOf = (useCase: UseCase, id: string | Record<string, string>): Record<string, string> =>
  typeof id === "string" ? (useCase.idName ? { [useCase.idName]: id } : {}) : id;

async function viaRoute(useCase: UseCase, id: string | Record<string, string>, fields: Fields): Promise<Outcome> {
  const response = await useCase.route(jsonRequest(useCase.method, "/x", useCase.method === "DELETE" ? undefined : fields), params(idsOf(useCase, id)));
  const json = await response.json();
  if (json.project?.id) projectsMade.push(json.project.id);
  if (response.status === 200 || response.status === 201) return "done";
  // The form shows a list's errors beside the list ("roles.0" → "roles", app/_lib/action-errors.ts); compare by field.
  if (response.status === 422) return `invalid:${[...new Set(json.errors.map((e: { path: string }) => e.path.replace(/(\.\d+)+$/, "")))].sort().join(",")}`;
  if (response.status === 409) return `refused:${json.errors[0].message}`;
  return ({ 401: "signed-out", 403: "forbidden", 404: "not-found" } as Record<number, string>)[response.status] ?? `status ${response.status}`;
}

async function viaAction(useCase: UseCase, id: string | Record<string, string>, fields: Fields): Promise<Outcome> {
  // A form sends text: true/false as the words (the API's booleans).
  const form = Object.fromEntries(Object.entries(fields).map(([k, v]) => [k, typeof v === "boolean" ? String(v) : v]));
  const outcome = await outcomeOf(() => useCase.action({}, toFormData({ ...form, ...idsOf(useCase, id) })));
  if (outcome.kind === "redirect") {
    if (outcome.location.startsWith("/login")) return "signed-out";
    const made = outcome.location.match(/^\/projects\/([0-9a-f-]{36})$/);
    if (made && useCase === USE_CASES.createProject) projectsMade.push(made[1]);
    return "done";
  }
  if (outcome.kind === "status") return ({ 403: "forbidden", 404: "not-found" } as Record<number, string>)[outcome.status] ?? `status ${outcome.status}`;
  const state = outcome.value as { ok?: boolean; message?: string; fieldErrors?: Record<string, string[]> };
  if (state.ok) return "done";
  if (state.fieldErrors) return `invalid:${Object.keys(state.fieldErrors).sort().join(",")}`;
  return `refused:${state.message}`;
}

describe("each API route and its server action give the same outcome", () => {
  it.each(CASES.map((c) => ({ ...c, label: `${USE_CASES[c.useCase].name} as ${c.who ?? "nobody"} → ${c.expected}` })))("$label", async (c) => {
    engineerId ||= await userId(ENGINEER);
    installerId ||= await userId(INSTALLER);
    const useCase = USE_CASES[c.useCase];
    const outcomes: Outcome[] = [];
    for (const door of [viaRoute, viaAction]) {
      const id = c.id ?? (await useCase.setup());
      await actAs(c.who);
      outcomes.push(await door(useCase, id, c.fields()));
    }
    expect(outcomes).toEqual([c.expected, c.expected]);
  });

  it("the last active admin is kept, refused with the same words by both", async () => {
    const outcomes: Outcome[] = [];
    for (const door of [viaRoute, viaAction]) {
      const [org] = await db("organisations").insert({ name: "Parity Solo Co (invented)" }).returning("id");
      const admin = await freshMember({ organisationId: org.id, roles: ["admin"] });
      await actAs(admin.email);
      outcomes.push(await door(USE_CASES.changeRoles, admin.membershipId, { roles: ["designer"] }));
    }
    expect(outcomes[0]).toMatch(/^refused:You are the last active admin of Parity Solo Co \(invented\), so you cannot remove the admin role/);
    expect(outcomes[1]).toBe(outcomes[0]);
  });

  it("a conflict is refused with the same words by both", async () => {
    const outcomes: Outcome[] = [];
    for (const door of [viaRoute, viaAction]) {
      const id = await USE_CASES.decide.setup();
      await db("revisions").where({ id }).update({ status: "changes_requested" });
      await actAs(ENGINEER);
      outcomes.push(await door(USE_CASES.decide, id, { decision: "approve", password: DEMO_PASSWORD }));
    }
    expect(outcomes[0]).toMatch(/^refused:Only a revision in review can be decided/);
    expect(outcomes[1]).toBe(outcomes[0]);
  });
});
