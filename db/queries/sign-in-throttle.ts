import { db } from "../client";

/**
 * Failed sign-ins (and approval signatures, and invitation passwords), counted in PostgreSQL so
 * the limits hold across restarts and several app servers. E-mails that match no account are
 * counted the same way, so the answer never tells whether an account exists.
 *
 * What is limited, so an attacker cannot use the limit against a real person:
 * - one address on one account: `perEmail` failures in the window, then that pair waits;
 * - one address spraying many accounts: `perAddress` failures across at least `sprayAccounts`
 *   different e-mails, then that address waits (failures on one account never block others);
 * - one account from everywhere: past `perAccountCeiling` failures, only addresses that have
 *   themselves failed on the account wait, the owner is e-mailed once per window, and an address
 *   with no failures on it still signs in with the right password.
 *
 * Counting is atomic: an attempt is reserved (recorded as a failure) under a transaction-scoped
 * advisory lock on the e-mail and the address before the password is checked, and the reservation
 * is removed when the password was right, so parallel guesses cannot all slip under the limit.
 */
export const THROTTLE = { windowMinutes: 15, perEmail: 5, perAddress: 20, sprayAccounts: 3, perAccountCeiling: 50 } as const;

export type Reservation =
  | { ok: true; attemptId: string; ceilingReached: boolean }
  | { ok: false; waitSeconds: number };

const normal = (email: string) => email.trim().toLowerCase();

/** Reserves one attempt, or says how long this address must wait for this account. */
export async function reserveAttempt(emailRaw: string, ip: string): Promise<Reservation> {
  const email = normal(emailRaw);
  return db.transaction(async (trx) => {
    // Email first, then address: every transaction takes them in this order, so none can deadlock.
    await trx.raw("select pg_advisory_xact_lock(hashtext(?))", [`sign-in:email:${email}`]);
    await trx.raw("select pg_advisory_xact_lock(hashtext(?))", [`sign-in:ip:${ip}`]);
    const since = trx.raw(`now() - make_interval(mins => ?)`, [THROTTLE.windowMinutes]);
    const { rows } = await trx.raw<{ rows: { pair: string; pair_first: Date | null; account: string; by_ip: string; ip_accounts: string; ip_first: Date | null }[] }>(
      `select
         count(*) filter (where email = :email and ip = :ip) as pair,
         min(at) filter (where email = :email and ip = :ip) as pair_first,
         count(*) filter (where email = :email) as account,
         count(*) filter (where ip = :ip) as by_ip,
         count(distinct email) filter (where ip = :ip) as ip_accounts,
         min(at) filter (where ip = :ip) as ip_first
       from sign_in_failures where at > :since and (email = :email or ip = :ip)`,
      { email, ip, since },
    );
    const r = rows[0];
    const waits: Date[] = [];
    if (Number(r.pair) >= THROTTLE.perEmail && r.pair_first) waits.push(r.pair_first);
    if (Number(r.by_ip) >= THROTTLE.perAddress && Number(r.ip_accounts) >= THROTTLE.sprayAccounts && r.ip_first) waits.push(r.ip_first);
    const ceilingReached = Number(r.account) >= THROTTLE.perAccountCeiling;
    // Under attack from many addresses, an address that has guessed wrong on this account waits; others do not.
    if (ceilingReached && Number(r.pair) > 0 && r.pair_first) waits.push(r.pair_first);
    if (waits.length) {
      const oldest = Math.min(...waits.map((d) => new Date(d).getTime()));
      return { ok: false, waitSeconds: Math.max(1, Math.ceil((oldest + THROTTLE.windowMinutes * 60_000 - Date.now()) / 1000)) } as const;
    }
    const [row] = await trx("sign_in_failures").insert({ email, ip }).returning("id");
    return { ok: true, attemptId: String(row.id), ceilingReached } as const;
  });
}

/** The password was right: the reservation goes, with this address's earlier failures on the account. */
export async function attemptSucceeded(attemptId: string, emailRaw: string, ip: string): Promise<void> {
  await db("sign_in_failures").where("id", attemptId).delete();
  await db("sign_in_failures").where({ email: normal(emailRaw), ip }).delete();
}

/** Seconds until this address may try this account again (0 when now), without reserving anything. */
export async function secondsUntilAllowed(emailRaw: string, ip: string): Promise<number> {
  const email = normal(emailRaw);
  const since = db.raw(`now() - make_interval(mins => ?)`, [THROTTLE.windowMinutes]);
  const row = await db("sign_in_failures").where({ email, ip }).where("at", ">", since).first<{ n: string; first: Date | null }>(db.raw("count(*) as n"), db.raw("min(at) as first"));
  if (Number(row?.n) < THROTTLE.perEmail || !row?.first) return 0;
  return Math.max(1, Math.ceil((new Date(row.first).getTime() + THROTTLE.windowMinutes * 60_000 - Date.now()) / 1000));
}

/** Records one failure without a reservation (kept for callers that check first). */
export async function recordFailure(email: string, ip: string): Promise<void> {
  await db("sign_in_failures").insert({ email: normal(email), ip });
}

/** Clears all failures of an account (after a password reset). */
export async function clearFailures(email: string): Promise<void> {
  await db("sign_in_failures").where("email", normal(email)).delete();
}
