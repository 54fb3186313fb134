import { db } from "../client";

/**
 * Failed sign-ins are counted per account e-mail and per address over a sliding window, in
 * PostgreSQL so the limit holds across restarts and several app servers. E-mails that match no
 * account are counted the same way, so the answer never tells whether an account exists.
 */
export const THROTTLE = { windowMinutes: 15, perEmail: 5, perAddress: 20 } as const;

export async function recordFailure(email: string, ip: string): Promise<void> {
  await db("sign_in_failures").insert({ email, ip });
}

/** Seconds until another attempt is allowed, or 0 when it is allowed now. */
export async function secondsUntilAllowed(email: string, ip: string): Promise<number> {
  const since = db.raw(`now() - interval '${THROTTLE.windowMinutes} minutes'`);
  const window = (column: "email" | "ip", value: string) =>
    db("sign_in_failures")
      .where(column, value)
      .where("at", ">", since)
      .first<{ n: string; first: Date | null }>(db.raw("count(*) as n"), db.raw("min(at) as first"));
  const [byEmail, byIp] = await Promise.all([window("email", email), window("ip", ip)]);
  const blocked = [
    Number(byEmail?.n) >= THROTTLE.perEmail ? byEmail?.first : null,
    Number(byIp?.n) >= THROTTLE.perAddress ? byIp?.first : null,
  ].filter((d): d is Date => Boolean(d));
  if (blocked.length === 0) return 0;
  const oldest = Math.min(...blocked.map((d) => new Date(d).getTime()));
  return Math.max(1, Math.ceil((oldest + THROTTLE.windowMinutes * 60_000 - Date.now()) / 1000));
}

export async function clearFailures(email: string): Promise<void> {
  await db("sign_in_failures").where("email", email).delete();
}
