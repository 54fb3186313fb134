import crypto from "node:crypto";

/**
 * Tokens for e-mailed links (invitations, password resets). The link carries 32 random bytes; the
 * database keeps only their SHA-256, so a leaked table cannot be turned back into working links.
 */
export function newToken(): { token: string; tokenHash: string } {
  const token = crypto.randomBytes(32).toString("base64url");
  return { token, tokenHash: hashToken(token) };
}

export function hashToken(token: string): string {
  return crypto.createHash("sha256").update(token, "utf8").digest("hex");
}

export const INVITATION_TTL_MS = 7 * 24 * 60 * 60 * 1000;
export const PASSWORD_RESET_TTL_MS = 60 * 60 * 1000;
export const SIGN_UP_TTL_MS = 24 * 60 * 60 * 1000;
