import { hash, verify } from "@node-rs/argon2";

/** Argon2id with the library's defaults (memory-hard); never store or log a plain password. */
export function hashPassword(password: string): Promise<string> {
  return hash(password);
}

export async function verifyPassword(passwordHash: string, password: string): Promise<boolean> {
  try {
    return await verify(passwordHash, password);
  } catch {
    return false;
  }
}
