import { getSession } from "./session";

/** Starts a fresh session (a new cookie, never the one the caller arrived with) for a member of an organisation. */
export async function startSession(userId: string, organisationId: string): Promise<void> {
  const session = await getSession();
  session.destroy();
  session.userId = userId;
  session.organisationId = organisationId;
  session.signedInAt = Date.now();
  await session.save();
}
