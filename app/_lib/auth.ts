import { cache } from "react";
import { hasAcceptedEngagement, type ProjectScope } from "@/db/queries/engagements";
import type { MemberRecord } from "@/db/queries/users";
import { ROLE_LABELS, type Role } from "@/db/roles";
import { AccessError } from "./errors";
import { readSession } from "./session";
import { openSessionMember } from "@/db/queries/sessions";

/**
 * The data-access checks. Every page, server action and route handler that reads or writes data
 * calls one of these next to its query; layouts never decide access. Order matters: first who you
 * are (401), then whether the data is your organisation's (404, so other organisations cannot
 * probe for ids), then whether your role may do this (403).
 */
export type CurrentUser = MemberRecord;

// Lives in ./errors with the rest of the error vocabulary; re-exported for the many callers here.
export { AccessError };

/** The signed-in, active member for this request, or null. Cached per request. */
export const currentUser = cache(async (): Promise<CurrentUser | null> => {
  const session = await readSession();
  if (!session.userId || !session.organisationId) return null;
  // The cookie is only a pointer: its server-side record must still be open (sign-out ends it).
  // One statement: the session is open (and marked seen) and the member active.
  const member = session.sessionId ? await openSessionMember(session.sessionId, session.userId, session.organisationId) : undefined;
  // A password reset ends every session that began before it.
  if (member?.passwordChangedAt && (session.signedInAt ?? 0) < new Date(member.passwordChangedAt).getTime()) return null;
  return member ?? null;
});

export async function requireUser(): Promise<CurrentUser> {
  const user = await currentUser();
  if (!user) throw new AccessError(401, "Sign in to continue.");
  return user;
}

export function hasRole(user: CurrentUser, ...roles: Role[]): boolean {
  return roles.some((role) => user.roles.includes(role));
}

/** Throws 403 unless the user holds at least one of the roles. */
export function assertRole(user: CurrentUser, ...roles: Role[]): void {
  if (!hasRole(user, ...roles)) {
    const names = roles.map((r) => ROLE_LABELS[r].toLowerCase()).join(" or ");
    throw new AccessError(403, `Only a member with the ${names} role can do this.`);
  }
}

export async function requireRole(...roles: Role[]): Promise<CurrentUser> {
  const user = await requireUser();
  assertRole(user, ...roles);
  return user;
}

/** Throws 404 when a record is missing or belongs to another organisation. */
export function assertOwned<T extends { organisationId: string }>(user: CurrentUser, record: T | undefined, what = "That record"): T {
  if (!record || record.organisationId !== user.organisationId) throw new AccessError(404, `${what} was not found.`);
  return record;
}

/**
 * Like `assertOwned`, but an outside reviewing engineer with an accepted engagement on the record's
 * project passes too. The project is found from the record itself (never from the URL), and the
 * engagement must be given by the record's own organisation, so an engineer engaged by two
 * contractors cannot reach one's data through the other's ids. Only reads and the engineer's own
 * review work (decide, clear a hold) call this; every other check stays `assertOwned`, so the rest
 * of the contractor's data answers 404 to them. Still who → whose → which role: callers check the
 * role after this.
 */
export async function assertOwnedOrEngaged<T extends { organisationId: string }>(
  user: CurrentUser,
  record: T | undefined,
  scope: (record: T) => ProjectScope,
  what = "That record",
): Promise<T> {
  if (record && record.organisationId === user.organisationId) return record;
  if (record && (await hasAcceptedEngagement(user.userId, record.organisationId, scope(record)))) return record;
  throw new AccessError(404, `${what} was not found.`);
}

/** True when the user reaches this organisation's record as an engaged outside engineer, not as a member. */
export function isOutsider(user: CurrentUser, record: { organisationId: string }): boolean {
  return record.organisationId !== user.organisationId;
}
