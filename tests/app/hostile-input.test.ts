/**
 * The hostile-input suite of the hardening issue: thousands of generated bodies for every JSON
 * route, and generated list parameters, as a signed-in member who may call the route. Whatever is
 * sent, the answer is never a 5xx, and every 4xx names a field or the body
 * (`{ errors: [{ path, message }] }` with a non-empty message).
 */
import fc from "fast-check";
import { beforeAll, describe, expect, it } from "vitest";
import { POST as calc } from "@/app/api/calc/route";
import { POST as saveRevision } from "@/app/api/designs/[designId]/revisions/route";
import { GET as listDesigns, POST as createDesign } from "@/app/api/projects/[projectId]/designs/route";
import { PATCH as patchProject } from "@/app/api/projects/[projectId]/route";
import { GET as listProjects, POST as createProject } from "@/app/api/projects/route";
import { POST as review } from "@/app/api/revisions/[revisionId]/review/route";
import { POST as submit } from "@/app/api/revisions/[revisionId]/submit/route";
import { POST as signIn } from "@/app/api/session/route";
import { POST as invite } from "@/app/api/invitations/route";
import { PATCH as patchMember } from "@/app/api/members/[membershipId]/route";
import { POST as engage } from "@/app/api/projects/[projectId]/engagements/route";
import { freshMember } from "../support/accounts";
import { actAs, jsonRequest, params } from "../support/next-context";
import { DESIGNER, ENGINEER, makeDesign } from "../support/review-fixtures";

type Route = (request: Request, context: never) => Promise<Response>;

/** JSON values with the keys and strings attackers try: prototype names, NUL and other control characters, huge numbers. */
const hostileString = fc.oneof(
  fc.string(),
  fc.constantFrom("__proto__", "constructor", "toString", "\u0000", "a\u0000b", "\u001b[31m", "%E0%A4%A", "-".repeat(36), "NaN", "Infinity", "1e309", "<script>", "' OR 1=1 --"),
);
const hostileJson = fc.letrec((tie) => ({
  value: fc.oneof(
    { depthSize: "small" },
    hostileString,
    fc.double(),
    fc.integer(),
    fc.boolean(),
    fc.constant(null),
    fc.array(tie("value"), { maxLength: 4 }),
    fc.dictionary(hostileString, tie("value"), { maxKeys: 5 }),
  ),
})).value;
/** Bodies shaped like the real ones, with hostile values in their fields. */
const shaped = (keys: string[]) => fc.dictionary(fc.constantFrom(...keys, "__proto__", "extra"), hostileJson, { maxKeys: keys.length + 1 });

async function expectNamedAnswer(response: Response, label: string): Promise<void> {
  expect(response.status, label).toBeLessThan(500);
  if (response.status >= 400) {
    const body = await response.json();
    expect(Array.isArray(body.errors), label).toBe(true);
    for (const e of body.errors) {
      expect(typeof e.path, label).toBe("string");
      expect(typeof e.message === "string" && e.message.length > 0, label).toBe(true);
    }
  }
}

let design: { projectId: string; designId: string; revisionId: string };
let membershipId = "";
beforeAll(async () => {
  design = await makeDesign();
  membershipId = (await freshMember({ roles: ["installer"] })).membershipId;
});

const RUNS = 250;

describe("hostile JSON bodies: never a 5xx, every 4xx named", () => {
  const routes: [string, string, Route, () => Record<string, string>, string[]][] = [
    ["POST /api/calc", DESIGNER, calc as Route, () => ({}), ["site", "array", "posts", "footing"]],
    ["POST /api/projects", DESIGNER, createProject as Route, () => ({}), ["name", "address", "state", "latitude", "longitude", "notes", "criteriaCardId"]],
    ["PATCH /api/projects/:id", DESIGNER, patchProject as Route, () => ({ projectId: design.projectId }), ["name", "address", "state", "latitude", "notes"]],
    ["POST /api/projects/:id/designs", DESIGNER, createDesign as Route, () => ({ projectId: design.projectId }), ["name", "input", "note"]],
    ["POST /api/designs/:id/revisions", DESIGNER, saveRevision as Route, () => ({ designId: design.designId }), ["baseRevisionId", "input", "note"]],
    ["POST /api/revisions/:id/submit", DESIGNER, submit as Route, () => ({ revisionId: design.revisionId }), ["engineerId"]],
    ["POST /api/revisions/:id/review", ENGINEER, review as Route, () => ({ revisionId: design.revisionId }), ["decision", "comments", "password", "overrides"]],
    ["POST /api/session", DESIGNER, signIn as Route, () => ({}), ["email", "password"]],
    ["POST /api/invitations", "admin@demo.pierwise.test", invite as Route, () => ({}), ["email", "roles"]],
    ["PATCH /api/members/:id", "admin@demo.pierwise.test", patchMember as Route, () => ({ membershipId }), ["roles", "active"]],
    ["POST /api/projects/:id/engagements", DESIGNER, engage as Route, () => ({ projectId: design.projectId }), ["email", "message"]],
  ];
  for (const [label, who, route, routeParams, keys] of routes) {
    it(label, async () => {
      await actAs(who);
      const method = label.split(" ")[0];
      await fc.assert(
        fc.asyncProperty(fc.oneof(hostileJson, shaped(keys)), async (body) => {
          await expectNamedAnswer(await route(jsonRequest(method, "/x", body), params(routeParams()) as never), `${label} ${JSON.stringify(body)}`);
        }),
        { numRuns: RUNS },
      );
      // Bodies that are not JSON at all.
      await fc.assert(
        fc.asyncProperty(fc.string(), async (text) => {
          await expectNamedAnswer(await route(jsonRequest(method, "/x", text), params(routeParams()) as never), `${label} raw ${JSON.stringify(text)}`);
        }),
        { numRuns: 50 },
      );
    }, 120_000);
  }
});

describe("hostile list parameters: never a 5xx", () => {
  it("GET /api/projects and GET /api/projects/:id/designs", async () => {
    await actAs(DESIGNER);
    const value = fc.oneof(hostileString, fc.integer().map(String), fc.double().map(String));
    await fc.assert(
      fc.asyncProperty(fc.record({ q: value, sort: value, dir: value, page: value, pageSize: value }, { requiredKeys: [] }), async (query) => {
        const search = new URLSearchParams(query as Record<string, string>).toString();
        await expectNamedAnswer(await listProjects(jsonRequest("GET", `/api/projects?${search}`), {} as never), `projects ?${search}`);
        await expectNamedAnswer(await listDesigns(jsonRequest("GET", `/x?${search}`), params({ projectId: design.projectId })), `designs ?${search}`);
      }),
      { numRuns: 300 },
    );
  }, 120_000);
});
