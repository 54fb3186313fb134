/**
 * Outside reviewing engineers for tests: a fresh firm with one engineer (licensed in CO unless told
 * otherwise), engagements written straight to the table in any state, and the fixed cast of the
 * access matrix (engaged = the demo outside engineer, revoked, never engaged).
 */
import crypto from "node:crypto";
import { hashPassword } from "@/app/_lib/password";
import { db } from "@/db/client";
import { DEMO_ORG_ID } from "@/db/seeds/01_demo_accounts";
import type { EngagementStatus } from "@/db/queries/engagements";
import { uniqueEmail } from "./accounts";

export const OUTSIDE_PASSWORD = "outside-engineer-password";

export async function freshOutsideEngineer(options: { email?: string; licensed?: boolean; roles?: string[] } = {}) {
  const email = options.email ?? uniqueEmail("outside");
  const [org] = await db("organisations").insert({ name: `Test Review Firm ${crypto.randomUUID().slice(0, 6)} (invented)` }).returning("id");
  const [user] = await db("users").insert({ email, name: `Test Engineer ${email.slice(0, 12)}, P.E.`, password_hash: await hashPassword(OUTSIDE_PASSWORD) }).returning("id");
  await db("memberships").insert({ organisation_id: org.id, user_id: user.id, roles: db.raw("?::member_role[]", [`{${(options.roles ?? ["admin", "engineer"]).join(",")}}`]) });
  if (options.licensed !== false) {
    await db("engineer_licences").insert({ user_id: user.id, state: "CO", licence_number: `PE-T${crypto.randomInt(1e6)}`, expires_on: "2031-12-31" });
  }
  return { email, userId: user.id as string, organisationId: org.id as string };
}

/** An engagement row in the given state (no e-mail, no token anyone knows). */
export async function engage(projectId: string, engineer: { email: string; userId: string }, status: EngagementStatus, organisationId = DEMO_ORG_ID): Promise<string> {
  const invitedBy = (await db("memberships").where({ organisation_id: organisationId }).whereNull("deactivated_at").orderBy("created_at").first("user_id")).user_id;
  const [row] = await db("engagements")
    .insert({
      organisation_id: organisationId, project_id: projectId, email: engineer.email.toLowerCase(), status,
      engineer_user_id: status === "invited" ? null : engineer.userId,
      token_hash: crypto.createHash("sha256").update(crypto.randomBytes(32)).digest("hex"), invited_by: invitedBy,
      ...(status === "revoked" && { revoked_at: db.fn.now() }),
    })
    .returning("id");
  return row.id;
}

export const REVOKED_ENGINEER = "revoked@outside.pierwise.test";
export const UNENGAGED_ENGINEER = "unengaged@outside.pierwise.test";

/** The access matrix's revoked and never-engaged outside engineers (created once per test database). */
export async function ensureOutsideCast(): Promise<void> {
  for (const email of [REVOKED_ENGINEER, UNENGAGED_ENGINEER]) {
    if (!(await db("users").where({ email }).first("id"))) await freshOutsideEngineer({ email });
  }
}

export async function idOf(email: string): Promise<string> {
  return (await db("users").where({ email }).first("id")).id;
}

/** An invited engagement whose link token is known (for the sign-up from the link). */
export async function engagementWithToken(projectId: string, email: string): Promise<{ id: string; token: string }> {
  const token = crypto.randomBytes(32).toString("base64url");
  const invitedBy = (await db("users").where({ email: "designer@demo.pierwise.test" }).first("id")).id;
  const [row] = await db("engagements")
    .insert({ organisation_id: DEMO_ORG_ID, project_id: projectId, email, token_hash: crypto.createHash("sha256").update(token, "utf8").digest("hex"), invited_by: invitedBy })
    .returning("id");
  return { id: row.id, token };
}
