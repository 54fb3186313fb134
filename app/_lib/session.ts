import { getIronSession, unsealData, type SessionOptions } from "iron-session";
import { cookies, headers } from "next/headers";
import { env } from "./env";
import { servedOverHttps } from "./request-ip";

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

/**
 * The session for signing in and out. Its cookie is `Secure` whenever this request came over
 * https, also behind a trusted proxy that terminated TLS (servedOverHttps), so the browser never
 * sends it over plain http.
 */
export async function getSession() {
  const options = sessionOptions();
  const secure = servedOverHttps(await headers(), env.appUrl);
  return getIronSession<SessionData>(await cookies(), { ...options, cookieOptions: { ...options.cookieOptions, secure } });
}

/**
 * Unsealed session cookies, by their sealed text. Unsealing (key derivation, HMAC check,
 * decryption) costs about 1 ms of CPU, more than a whole calculation; the same cookie always
 * unseals to the same data, so each is unsealed once and kept until its seal expires (at most
 * 5 minutes, at most 1000 cookies). Sign-out and password changes are unaffected: `currentUser`
 * checks the session record, the member and the password date in the database on every request.
 */
const unsealed = new Map<string, { data: SessionData; until: number }>();
const UNSEALED_MAX = 1000;

/** The session's data for reading only (access checks); `getSession` for signing in and out. */
export async function readSession(): Promise<SessionData> {
  const options = sessionOptions();
  const sealed = (await cookies()).get(options.cookieName)?.value;
  if (!sealed) return {};
  const now = Date.now();
  const hit = unsealed.get(sealed);
  if (hit && hit.until > now) return hit.data;
  const data = await unsealData<SessionData>(sealed, { password: options.password, ttl: options.ttl });
  // Only good seals are kept (a bad or expired one unseals to {}). Iron's 6th field is the seal's
  // expiry in ms, covered by the HMAC just checked.
  if (data.userId) {
    const expiresAt = Number(sealed.split("~")[0].split("*")[5]) || now;
    if (unsealed.size >= UNSEALED_MAX) unsealed.delete(unsealed.keys().next().value!);
    unsealed.set(sealed, { data, until: Math.min(expiresAt, now + 5 * 60_000) });
  }
  return data;
}
