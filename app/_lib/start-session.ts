import { headers } from "next/headers";
import { openSession } from "@/db/queries/sessions";
import { requestIp } from "./request-ip";
import { getSession, sessionOptions } from "./session";

/**
 * Starts a fresh session (a new cookie, never the one the caller arrived with) for a member of an
 * organisation, with a server-side record the cookie points at: ending that record ends the session.
 */
export async function startSession(userId: string, organisationId: string): Promise<void> {
  const ttlSeconds = sessionOptions().ttl ?? 60 * 60 * 12;
  const sessionId = await openSession({ userId, organisationId, ttlSeconds, ip: await requestIp(), userAgent: (await headers()).get("user-agent") });
  const session = await getSession();
  session.destroy();
  session.userId = userId;
  session.organisationId = organisationId;
  session.sessionId = sessionId;
  session.signedInAt = Date.now();
  await session.save();
}
