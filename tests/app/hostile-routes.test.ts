/**
 * Every API route, found from the folders under app/api (so a new route is swept without being
 * listed), called with what an attacker sends instead of what the route expects: ids that are not
 * uuids (negative, overflowing, path traversal, control characters, 10,000 characters), repeated
 * and hostile query parameters, bodies that are not JSON, JSON with NaN/Infinity/1e400, wrong
 * content types, oversized bodies, and uploads with hostile file names and descriptions. As each
 * role that may call it. The answer is never a 5xx, and every 4xx is `{ errors: [{ path, message }] }`
 * with a message; where one field is at fault, `path` names it.
 * (The generated-body suite is tests/app/hostile-input.test.ts; the statuses of single findings are
 * in bad-input-statuses.test.ts and request-guards.test.ts.)
 */
import fs from "node:fs";
import path from "node:path";
import { pathToFileURL } from "node:url";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { db } from "@/db/client";
import { DEMO_ORG_ID } from "@/db/seeds/01_demo_accounts";
import { freshMember } from "../support/accounts";
import { engage, freshOutsideEngineer } from "../support/engagement-fixtures";
import { actAs, params } from "../support/next-context";
import { ADMIN, DESIGNER, ENGINEER, freshAsBuilt, makeDesign } from "../support/review-fixtures";

type Handler = (request: Request, context: { params: Promise<Record<string, string>> }) => Promise<Response>;
interface Route { url: string; method: string; handler: Handler; dynamic: string[] }

const METHODS = ["GET", "POST", "PUT", "PATCH", "DELETE"];

/** Every route handler under app/api, with its URL pattern and dynamic segment names. */
async function apiRoutes(): Promise<Route[]> {
  const apiDir = path.join(process.cwd(), "app/api");
  const files: string[] = [];
  const walk = (dir: string) => {
    for (const e of fs.readdirSync(dir, { withFileTypes: true })) {
      if (e.isDirectory()) walk(path.join(dir, e.name));
      else if (e.name === "route.ts") files.push(path.join(dir, e.name));
    }
  };
  walk(apiDir);
  const routes: Route[] = [];
  for (const file of files.sort()) {
    const segments = path.relative(path.join(process.cwd(), "app"), path.dirname(file)).split(path.sep);
    const mod = (await import(pathToFileURL(file).href)) as Record<string, unknown>;
    for (const method of METHODS) {
      if (typeof mod[method] === "function") {
        routes.push({ url: `/${segments.join("/")}`, method, handler: mod[method] as Handler, dynamic: segments.filter((s) => s.startsWith("[")).map((s) => s.slice(1, -1)) });
      }
    }
  }
  return routes;
}

/** Ids that are not ids: PostgreSQL must never see them as a uuid. */
const HOSTILE_IDS = [
  "-".repeat(36), "-1", "0", "99999999999999999999999999", "1e309", "NaN", "Infinity", "../../etc/passwd", "..%2F..%2Fetc%2Fpasswd",
  "..\\..\\windows\\win.ini", "\u0000", "a\u0000b", "\u202e", "x".repeat(10_000), "00000000-0000-0000-0000-00000000000g",
  " 7d0c2f0e-1b8a-4c2e-9f3a-0a1b2c3d4e5f", "7d0c2f0e-1b8a-4c2e-9f3a-0a1b2c3d4e5f\n", "{}", "[]", "null", "undefined", "__proto__",
];

/** Query strings with repeated and hostile parameters (as the URL carries them, already encoded). */
const HOSTILE_QUERIES = [
  "page=1&page=-1&page=abc", "sort=name&sort=__proto__&dir=asc&dir=sideways", "page=-1", "page=0", "page=1e309", "page=99999999999999999999",
  "page=NaN", "pageSize=Infinity", "pageSize=-5", "pageSize=100000000", "q=%00", "q=a%1Bb", `q=${"z".repeat(20_000)}`, "q=%25%5F%5C",
  "dir=__proto__", "sort=constructor", "variant=../../etc/passwd", "variant=thumbnail&variant=original", "units=../../x", "units=metric&units=us",
  "sections=__proto__,constructor", "sections=footing,footing,footing", `sections=${"a,".repeat(5_000)}`, "older=not-a-cursor", "newer=%00",
  "older=2020-01-01_-1", "state=__proto__", "q[]=1&q[x]=2",
];

/** Request bodies that are not what a JSON route expects, with the content type sent. */
const HOSTILE_BODIES: [string, string, string][] = [
  ["broken JSON", "application/json", "{\"name\": "],
  ["NaN literal", "application/json", "NaN"],
  ["Infinity in a field", "application/json", "{\"name\": Infinity, \"latitude\": -Infinity}"],
  ["number past double range", "application/json", "{\"latitude\": 1e400, \"longitude\": -1e400, \"site\": {\"windSpeedMph\": 1e400}}"],
  ["numbers as words", "application/json", "{\"latitude\": \"NaN\", \"longitude\": \"Infinity\", \"active\": \"false\", \"roles\": \"admin\"}"],
  ["control characters in a key and value", "application/json", "{\"na\\u0000me\": \"x\", \"email\": \"a\\u0007@b.test\"}"],
  ["bidi and zero-width text", "application/json", "{\"name\": \"\\u202egnp.exe\\u200b\", \"email\": \"\\u200badmin@demo.pierwise.test\"}"],
  ["lone surrogate", "application/json", "{\"name\": \"\\ud800\", \"message\": \"\\udfff\"}"],
  ["prototype keys", "application/json", "{\"__proto__\": {\"admin\": true}, \"constructor\": {\"prototype\": {\"x\": 1}}}"],
  ["nested 5,000 deep", "application/json", `${"[".repeat(5_000)}${"]".repeat(5_000)}`],
  ["wrong top-level types", "application/json", "[\"name\", \"state\"]"],
  ["empty body with JSON type", "application/json", ""],
  ["JSON as text/plain", "text/plain", "{\"name\": \"x\", \"state\": \"CO\"}"],
  ["form-encoded", "application/x-www-form-urlencoded", "name=x&state=CO"],
  ["multipart to a JSON route", "multipart/form-data; boundary=xyz", "--xyz\r\nContent-Disposition: form-data; name=\"name\"\r\n\r\nx\r\n--xyz--\r\n"],
  ["JSON with a foreign charset", "application/json; charset=utf-16", "{\"name\": \"x\"}"],
  ["over 1 MB undeclared", "application/json", `{"name": "${"a".repeat(1_100_000)}"}`],
];

let ids: Record<string, string> = {};
const created: { projects: string[] } = { projects: [] };
beforeAll(async () => {
  const design = await makeDesign();
  const asBuilt = await freshAsBuilt();
  const member = await freshMember({ roles: ["installer"] });
  const outside = await freshOutsideEngineer();
  const engagementId = await engage(design.projectId, outside, "accepted");
  const [invitation] = await db("invitations").select("id").where({ organisation_id: DEMO_ORG_ID }).limit(1);
  ids = {
    projectId: design.projectId, designId: design.designId, revisionId: design.revisionId, entryId: asBuilt.entryId, index: "0",
    membershipId: member.membershipId, engagementId, invitationId: invitation?.id ?? crypto.randomUUID(), fileId: crypto.randomUUID(),
  };
  created.projects.push(design.projectId);
});
afterAll(async () => {
  await db("sign_in_failures").delete();
});

/** The people who may call routes: each role, so the checks after the access check are reached too. */
const CALLERS = [DESIGNER, ENGINEER, ADMIN];

/** Signs in again only when needed: sign-out (DELETE /api/session) ends the session each time. */
let signedInAs: string | null = null;
async function callAs(caller: string, route: Route): Promise<void> {
  if (signedInAs === caller && !(route.url === "/api/session" && route.method === "DELETE")) return;
  await actAs(caller);
  signedInAs = caller;
}

function build(route: Route, values: Record<string, string>, query = "", body?: { type: string; text: string }): [Request, { params: Promise<Record<string, string>> }] {
  const url = route.url.replace(/\[([^\]]+)\]/g, (_, name: string) => encodeURIComponent(values[name] ?? ""));
  const headers: Record<string, string> = {};
  if (body?.type) headers["content-type"] = body.type;
  const request = new Request(`http://127.0.0.1${url}${query ? `?${query}` : ""}`, { method: route.method, headers, body: body && route.method !== "GET" ? body.text : undefined });
  return [request, params(Object.fromEntries(route.dynamic.map((name) => [name, values[name] ?? ""])))];
}

/** Never a 5xx; a 4xx is `{ errors: [{ path, message }] }`; returns the errors (empty for a 2xx/3xx). */
async function namedAnswer(response: Response, label: string): Promise<{ path: string; message: string }[]> {
  expect(response.status, label).toBeLessThan(500);
  if (response.status < 400) return [];
  const body = await response.json().catch(() => null);
  expect(body && Array.isArray(body.errors) && body.errors.length > 0, `${label}: ${response.status} without { errors }`).toBe(true);
  for (const e of body.errors) {
    expect(typeof e.path, label).toBe("string");
    expect(typeof e.message === "string" && e.message.length > 0, label).toBe(true);
  }
  return body.errors;
}

describe("every API route under hostile input: never a 5xx, every 4xx named", () => {
  let routes: Route[] = [];
  beforeAll(async () => {
    routes = await apiRoutes();
  });

  it("finds the routes (a broken finder would sweep nothing)", () => {
    expect(routes.length).toBeGreaterThan(25);
    expect(routes.map((r) => `${r.method} ${r.url}`)).toEqual(expect.arrayContaining(["POST /api/calc", "PATCH /api/members/[membershipId]", "POST /api/projects/[projectId]/files"]));
  });

  it("ids that are not ids, in every dynamic segment: 404 (or 400), never a query error", { timeout: 180_000 }, async () => {
    for (const route of routes.filter((r) => r.dynamic.length)) {
      for (const caller of CALLERS) {
        for (const name of route.dynamic) {
          for (const bad of HOSTILE_IDS) {
            await callAs(caller, route);
            const label = `${caller} ${route.method} ${route.url} ${name}=${JSON.stringify(bad.slice(0, 40))}`;
            const body = route.method === "GET" ? undefined : { type: "application/json", text: "{}" };
            const response = await route.handler(...build(route, { ...ids, [name]: bad }, "", body));
            await namedAnswer(response, label);
            expect([400, 401, 403, 404, 405, 415, 422], label).toContain(response.status);
          }
        }
      }
    }
  });

  it("repeated and hostile query parameters: a 2xx with defaults or a 4xx naming the parameter", { timeout: 180_000 }, async () => {
    for (const route of routes) {
      // Writes read no list parameters: one caller is enough to show the query is ignored safely.
      for (const caller of route.method === "GET" ? CALLERS : [DESIGNER]) {
        // The report reads only `units`, and each answer renders a whole PDF: its own cases only.
        for (const query of route.url.endsWith("report.pdf") ? HOSTILE_QUERIES.filter((q) => q.includes("units")) : HOSTILE_QUERIES) {
          await callAs(caller, route);
          const label = `${caller} ${route.method} ${route.url}?${query.slice(0, 60)}`;
          const body = route.method === "GET" ? undefined : { type: "application/json", text: "{}" };
          const errors = await namedAnswer(await route.handler(...build(route, ids, query, body)), label);
          // A read has no body: a 422 there is about the query and names one of its parameters.
          if (route.method === "GET") {
            const names = new Set(new URLSearchParams(query).keys());
            for (const e of errors) if (e.path) expect([...names], `${label}: ${e.path}`).toContain(e.path.split(".")[0]);
          }
        }
      }
    }
  });

  it("bodies that are not the JSON a write expects: 4xx naming the body or the field", { timeout: 180_000 }, async () => {
    for (const route of routes.filter((r) => r.method !== "GET")) {
      for (const caller of CALLERS) {
        for (const [what, type, text] of HOSTILE_BODIES) {
          await callAs(caller, route);
          const label = `${caller} ${route.method} ${route.url} ${what}`;
          const response = await route.handler(...build(route, ids, "", { type, text }));
          const errors = await namedAnswer(response, label);
          if (route.url.endsWith("/files")) continue; // the upload route reads multipart (below)
          if (response.status === 415) expect(type.startsWith("application/json"), label).toBe(false);
          // Past 1 MB the body is never parsed: no answer about its fields.
          if (what === "over 1 MB undeclared") expect(response.status, label).not.toBe(422);
          if (what === "control characters in a key and value" && response.status === 422) {
            expect(errors[0].path, label).not.toContain("\u0000");
          }
        }
      }
    }
  });
});

describe("uploads with hostile names, fields and framing", () => {
  const PNG_1x1 = Buffer.from("iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mP8z8BQDwAEhQGAhKmMIQAAAABJRU5ErkJggg==", "base64");

  beforeAll(() => {
    signedInAs = null;
  });

  async function upload(form: FormData | { type: string; text: string }) {
    const { POST } = await import("@/app/api/projects/[projectId]/files/route");
    const init = form instanceof FormData ? { method: "POST", body: form } : { method: "POST", body: form.text, headers: { "content-type": form.type } };
    return POST(new Request(`http://127.0.0.1/api/projects/${ids.projectId}/files`, init), params({ projectId: ids.projectId }));
  }

  it("path traversal and control characters in the file name are stored as a plain name, never as a path", async () => {
    await actAs(DESIGNER);
    for (const name of ["../../../etc/passwd.png", "..\\..\\windows\\system32\\x.png", "/abs/olute.png", "a\u0000b.png", "\u202egnp.exe", `${"n".repeat(5_000)}.png`, "", "....//....//x.png"]) {
      const form = new FormData();
      form.append("file", new File([PNG_1x1], name, { type: "image/png" }));
      const response = await upload(form);
      await namedAnswer(response, `file name ${JSON.stringify(name.slice(0, 40))}`);
      if (response.status === 201) {
        const { file } = await response.json();
        const row = await db("project_files").where({ id: file.id }).first("original_name", "object_key");
        expect(row.original_name).not.toMatch(/[\\/\u0000]/);
        expect(row.original_name.length).toBeLessThanOrEqual(200);
        expect(row.object_key).not.toContain("..");
      } else {
        expect(response.status).toBe(422);
      }
    }
  });

  it("a description with control characters or over its limit is a 422 naming description", async () => {
    await actAs(DESIGNER);
    for (const description of ["before\u0000after", "bell\u0007", "d".repeat(301)]) {
      const form = new FormData();
      form.append("file", new File([PNG_1x1], "site.png", { type: "image/png" }));
      form.append("description", description);
      const errors = await namedAnswer(await upload(form), `description ${JSON.stringify(description.slice(0, 20))}`);
      expect(errors.map((e) => e.path)).toEqual(["description"]);
    }
  });

  it("a body that is not a well-formed form is a 422 naming file", async () => {
    await actAs(DESIGNER);
    const cases = [
      { type: "multipart/form-data; boundary=xyz", text: "--xyz\r\nContent-Disposition: form-data; name=\"file\"; filename=\"a.png\"\r\n\r\nunterminated" },
      { type: "multipart/form-data", text: "no boundary at all" },
      { type: "application/json", text: "{\"file\": \"../../etc/passwd\"}" },
      { type: "multipart/form-data; boundary=xyz", text: "--xyz--\r\n" },
    ];
    for (const c of cases) {
      const errors = await namedAnswer(await upload(c), `${c.type} ${JSON.stringify(c.text.slice(0, 30))}`);
      expect(errors.map((e) => e.path), c.type).toEqual(["file"]);
    }
  });
});
