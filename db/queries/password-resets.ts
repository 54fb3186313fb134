import type { Knex } from "knex";
import { db } from "../client";

/**
 * Records a reset link unless the person already had `maxPerHour` in the last hour (someone may be
 * flooding their inbox). The person's row is locked so simultaneous requests count correctly.
 */
export async function createPasswordReset(userId: string, tokenHash: string, expiresAt: Date, maxPerHour: number, outer?: Knex.Transaction): Promise<boolean> {
  const run = async (trx: Knex.Transaction) => {
    await trx("users").where("id", userId).forUpdate().first("id");
    const [row] = await trx("password_resets").where("user_id", userId).where("created_at", ">", trx.raw("now() - interval '1 hour'")).count({ n: "*" });
    if (Number(row.n) >= maxPerHour) return false;
    await trx("password_resets").insert({ user_id: userId, token_hash: tokenHash, expires_at: expiresAt });
    return true;
  };
  // The use case's transaction, when given, so the link, its audit event and its e-mail commit together.
  return outer ? run(outer) : db.transaction(run);
}

export type ResetState = "valid" | "used" | "expired" | "unknown";

export async function passwordResetState(tokenHash: string): Promise<ResetState> {
  const row = await db("password_resets").where("token_hash", tokenHash).first("used_at", "expires_at");
  if (!row) return "unknown";
  if (row.used_at) return "used";
  return new Date(row.expires_at).getTime() > Date.now() ? "valid" : "expired";
}

export type UseResetResult = { ok: true; userId: string; email: string; organisationId: string | null } | { ok: false; reason: Exclude<ResetState, "valid"> };

/**
 * Sets a new password through a reset link, in one transaction: the link is claimed with a
 * conditional update (single use), every other open link for the person is closed too, and the
 * person's failed sign-ins are forgiven.
 */
export async function consumePasswordReset(
  tokenHash: string,
  passwordHash: string,
  /** Runs inside the transaction once the password is set (the audit event), so both commit or neither does. */
  alongside?: (trx: Knex.Transaction, done: { userId: string; email: string; organisationId: string | null }) => Promise<void>,
): Promise<UseResetResult> {
  return db.transaction(async (trx) => {
    const [claimed] = await trx("password_resets")
      .where("token_hash", tokenHash)
      .whereNull("used_at")
      .where("expires_at", ">", trx.fn.now())
      .update({ used_at: trx.fn.now() })
      .returning("user_id");
    if (!claimed) {
      const row = await trx("password_resets").where("token_hash", tokenHash).first("used_at");
      return { ok: false, reason: !row ? "unknown" : row.used_at ? "used" : "expired" } as const;
    }
    const userId = claimed.user_id as string;
    await trx("password_resets").where("user_id", userId).whereNull("used_at").update({ used_at: trx.fn.now() });
    // The app's clock, not the database's: the new session started right after compares against it.
    const [user] = await trx("users").where("id", userId).update({ password_hash: passwordHash, password_changed_at: new Date() }).returning("email");
    await trx("sign_in_failures").where("email", user.email).delete();
    // Every session of the old password ends with it (a reset may follow a stolen password).
    await trx("user_sessions").where("user_id", userId).whereNull("ended_at").update({ ended_at: trx.fn.now() });
    const membership = await trx("memberships").where("user_id", userId).orderBy("created_at").first("organisation_id");
    const done = { userId, email: user.email as string, organisationId: (membership?.organisation_id as string | undefined) ?? null };
    if (alongside) await alongside(trx, done);
    return { ok: true, ...done } as const;
  });
}
