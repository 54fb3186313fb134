/**
 * Issue 19, fifth pass: every signed-in request checks its session and membership in one
 * prepared statement (`openSessionMember`, db/prepared.ts), with the same answers the two
 * statements it replaces gave: an open session of an active member is that member (and is marked
 * seen at most once a minute); an ended or expired session, another user's session, or a
 * deactivated membership is nobody. A prepared statement's generic plan is asked for that
 * statement alone: the pooled connections go back planning as usual.
 */
import { describe, expect, it } from "vitest";
import { db } from "@/db/client";
import { DEMO_ORG_ID } from "@/db/seeds/01_demo_accounts";
import { preparedRows } from "@/db/prepared";
import { openSession, openSessionMember } from "@/db/queries/sessions";
import { freshMember } from "../support/accounts";

async function session(userId: string, organisationId = DEMO_ORG_ID): Promise<string> {
  return openSession({ userId, organisationId, ttlSeconds: 3600, ip: null, userAgent: null });
}

describe("the signed-in check in one statement", () => {
  it("answers the member of an open session, with roles, organisation and time zone", async () => {
    const m = await freshMember({ roles: ["designer", "installer"] });
    const member = await openSessionMember(await session(m.userId), m.userId, DEMO_ORG_ID);
    expect(member).toMatchObject({ userId: m.userId, email: m.email, organisationId: DEMO_ORG_ID, roles: ["designer", "installer"] });
    expect(member!.organisationName).toBeTruthy();
    expect(member!.timeZone).toBeTruthy();
  });

  it("answers nobody for an ended or expired session, another person's session, a deactivated member, or a malformed id", async () => {
    const m = await freshMember();
    const other = await freshMember();
    const ended = await session(m.userId);
    await db("user_sessions").where({ id: ended }).update({ ended_at: db.fn.now() });
    expect(await openSessionMember(ended, m.userId, DEMO_ORG_ID)).toBeUndefined();
    const expired = await session(m.userId);
    await db("user_sessions").where({ id: expired }).update({ expires_at: db.raw("now() - interval '1 second'") });
    expect(await openSessionMember(expired, m.userId, DEMO_ORG_ID)).toBeUndefined();
    expect(await openSessionMember(await session(other.userId), m.userId, DEMO_ORG_ID)).toBeUndefined();
    const gone = await freshMember({ deactivated: true });
    expect(await openSessionMember(await session(gone.userId), gone.userId, DEMO_ORG_ID)).toBeUndefined();
    expect(await openSessionMember("not-a-uuid", m.userId, DEMO_ORG_ID)).toBeUndefined();
  });

  it("marks the session seen when its last touch is over a minute old, not on every request", async () => {
    const m = await freshMember();
    const id = await session(m.userId);
    const seen = async () => new Date((await db("user_sessions").where({ id }).first("last_seen_at")).last_seen_at).getTime();
    await db("user_sessions").where({ id }).update({ last_seen_at: db.raw("now() - interval '5 minutes'") });
    const stale = await seen();
    await openSessionMember(id, m.userId, DEMO_ORG_ID);
    const touched = await seen();
    expect(touched).toBeGreaterThan(stale + 4 * 60_000);
    await db("user_sessions").where({ id }).update({ last_seen_at: db.raw("now() - interval '20 seconds'") });
    const recent = await seen();
    await openSessionMember(id, m.userId, DEMO_ORG_ID);
    expect(await seen()).toBe(recent);
  });
});

describe("prepared statements", () => {
  it("return the rows an ordinary query returns, and leave every pooled connection planning as usual", async () => {
    const sql = "SELECT id, name FROM organisations WHERE id = ? OR name = ? ORDER BY id";
    const plain = (await db.raw(sql, [DEMO_ORG_ID, "no such name"])).rows;
    for (let i = 0; i < 8; i++) expect(await preparedRows(sql, [DEMO_ORG_ID, "no such name"])).toEqual(plain);
    // Ten at once take ten pooled connections: none is left with the generic-plan setting.
    const settings = await Promise.all(Array.from({ length: 10 }, () => db.raw("SHOW plan_cache_mode")));
    expect(settings.map((r) => r.rows[0].plan_cache_mode)).toEqual(Array(10).fill("auto"));
  });
});
