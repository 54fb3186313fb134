import type { Knex } from "knex";
import { db } from "../client";
import { preparedRows } from "../prepared";
import { isUuid } from "../ids";
import { isUniqueViolation } from "./organisations";

/**
 * Engagements of outside reviewing engineers on a contractor's project (see the migration
 * 20261202800000_engagements.ts). Only an accepted engagement grants anything; the access rule
 * itself lives in app/_lib/auth.ts.
 */
export type EngagementStatus = "invited" | "accepted" | "declined" | "revoked";

export interface Engagement {
  id: string;
  organisationId: string;
  organisationName: string;
  projectId: string;
  projectName: string;
  projectState: string;
  email: string;
  message: string;
  status: EngagementStatus;
  engineerUserId: string | null;
  engineerName: string | null;
  invitedByName: string;
  invitedAt: Date;
  respondedAt: Date | null;
  revokedAt: Date | null;
}

export class EngagementExistsError extends Error {}

function engagementQuery(knex: Knex = db) {
  return knex("engagements as g")
    .join("organisations as o", "o.id", "g.organisation_id")
    .join("projects as p", "p.id", "g.project_id")
    .join("users as i", "i.id", "g.invited_by")
    .leftJoin("users as e", "e.id", "g.engineer_user_id")
    .select(
      "g.id", "g.organisation_id as organisationId", "o.name as organisationName", "g.project_id as projectId",
      "p.name as projectName", "p.state as projectState", "g.email", "g.message", "g.status",
      "g.engineer_user_id as engineerUserId", "e.name as engineerName", "i.name as invitedByName",
      "g.invited_at as invitedAt", "g.responded_at as respondedAt", "g.revoked_at as revokedAt",
    );
}


export async function createEngagement(e: { organisationId: string; projectId: string; email: string; message: string; tokenHash: string; invitedBy: string }, knex: Knex = db): Promise<string> {
  try {
    const [row] = await knex("engagements")
      .insert({ organisation_id: e.organisationId, project_id: e.projectId, email: e.email, message: e.message, token_hash: e.tokenHash, invited_by: e.invitedBy })
      .returning("id");
    return row.id as string;
  } catch (error) {
    if (isUniqueViolation(error)) throw new EngagementExistsError();
    throw error;
  }
}

export async function getEngagement(id: string): Promise<Engagement | undefined> {
  if (!isUuid(id)) return undefined;
  return engagementQuery().where("g.id", id).first();
}

export async function findEngagementByToken(tokenHash: string): Promise<Engagement | undefined> {
  return engagementQuery().where("g.token_hash", tokenHash).first();
}

/** A project's engagements, newest first. */
export async function projectEngagements(projectId: string): Promise<Engagement[]> {
  return engagementQuery().where("g.project_id", projectId).orderBy("g.invited_at", "desc");
}

/** Everything this person was engaged on, by their account or (before they answered) their e-mail. */
export async function engagementsOfPerson(userId: string, email: string): Promise<Engagement[]> {
  return engagementQuery()
    .where((w) => w.where("g.engineer_user_id", userId).orWhere((x) => x.whereNull("g.engineer_user_id").where("g.email", email.toLowerCase())))
    .orderBy("g.invited_at", "desc");
}

/**
 * The engagements this person has not answered yet (what the queue page lists above the queue):
 * the same rows as `engagementsOfPerson` with status "invited", newest first, without reading the
 * accepted, declined and revoked ones (one per project they were ever engaged on).
 */
export async function invitationsOfPerson(userId: string, email: string): Promise<Engagement[]> {
  const { sql, bindings } = engagementQuery()
    .where("g.status", "invited")
    .where((w) => w.where("g.engineer_user_id", userId).orWhere((x) => x.whereNull("g.engineer_user_id").where("g.email", email.toLowerCase())))
    .orderBy("g.invited_at", "desc")
    .toSQL();
  // Prepared (db/prepared.ts): the queue page runs it on every view; planning it cost 0.3 ms, running it 0.05.
  return preparedRows<Engagement>(sql, bindings);
}

/** Moves an engagement from one of `from` to `to`; false when it was no longer in `from` (a race or a repeat). */
export async function setEngagementStatus(
  id: string,
  from: EngagementStatus[],
  to: EngagementStatus,
  by: { engineerUserId?: string; revokedBy?: string },
  knex: Knex = db,
): Promise<boolean> {
  const n = await knex("engagements")
    .where({ id })
    .whereIn("status", from)
    .update({
      status: to,
      ...(by.engineerUserId && { engineer_user_id: by.engineerUserId, responded_at: db.fn.now() }),
      ...(by.revokedBy && { revoked_by: by.revokedBy, revoked_at: db.fn.now() }),
    });
  return n === 1;
}

/** What an engaged record is reached through: its project, or a design or revision of it. */
export type ProjectScope = { projectId: string } | { designId: string } | { revisionId: string };

function projectOf(scope: ProjectScope) {
  if ("projectId" in scope) return db.raw("?::uuid", [scope.projectId]);
  if ("designId" in scope) return db("designs").where("id", scope.designId).select("project_id");
  return db("revisions as r").join("designs as d", "d.id", "r.design_id").where("r.id", scope.revisionId).select("d.project_id");
}

/** Does this user hold an accepted engagement on the scope's project, given by that organisation? */
export async function hasAcceptedEngagement(userId: string, organisationId: string, scope: ProjectScope): Promise<boolean> {
  const row = await db("engagements")
    .where({ engineer_user_id: userId, organisation_id: organisationId, status: "accepted" })
    .where("project_id", "=", projectOf(scope))
    .first("id");
  return Boolean(row);
}

/** Ids of projects the user is engaged on (accepted), for lists that add them to the user's own. */
export function acceptedProjectIds(userId: string) {
  return db("engagements").where({ engineer_user_id: userId, status: "accepted" }).select("project_id");
}

/** Engineers with an accepted engagement on a project (for the submit form), with their licences looked up by the caller. */
export async function engagedEngineers(projectId: string): Promise<{ userId: string; name: string; email: string; firmName: string | null }[]> {
  return db("engagements as g")
    .join("users as u", "u.id", "g.engineer_user_id")
    .where({ "g.project_id": projectId, "g.status": "accepted" })
    .orderBy("u.name")
    .select(
      "u.id as userId", "u.name", "u.email",
      db.raw(`(select o.name from memberships m join organisations o on o.id = m.organisation_id
               where m.user_id = u.id and m.deactivated_at is null order by m.created_at limit 1) as "firmName"`),
    );
}
