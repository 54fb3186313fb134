import { getIronSession, type SessionOptions } from "iron-session";
import { cookies } from "next/headers";
import { env } from "./env";

/** What the encrypted session cookie holds: who signed in, in which organisation, and when. */
export interface SessionData {
  userId?: string;
  organisationId?: string;
  signedInAt?: number;
  /** The user_sessions row this cookie belongs to; a cookie without an open row is signed out. */
  sessionId?: string;
}

export function sessionOptions(): SessionOptions {
  return {
    cookieName: "pierwise_session",
    password: env.sessionSecret,
    ttl: 60 * 60 * 12,
    cookieOptions: {
      httpOnly: true,
      sameSite: "lax",
      secure: env.appUrl.startsWith("https://"),
      path: "/",
    },
  };
}

export async function getSession() {
  return getIronSession<SessionData>(await cookies(), sessionOptions());
}
