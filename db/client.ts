import knex, { type Knex } from "knex";
import config from "../knexfile";

/**
 * The single Knex client. Kept on globalThis so that Next's dev reloads and the test runner's
 * module graph do not open a new pool each time a module is re-evaluated.
 */
const globalForDb = globalThis as unknown as { pierwiseDb?: Knex };

export const db: Knex = globalForDb.pierwiseDb ?? knex(config);
globalForDb.pierwiseDb = db;

/** True when a trivial query answers within the timeout. */
export async function databaseIsUp(timeoutMs = 2000): Promise<boolean> {
  try {
    await Promise.race([
      db.raw("select 1"),
      new Promise((_, reject) => setTimeout(() => reject(new Error("timeout")), timeoutMs)),
    ]);
    return true;
  } catch {
    return false;
  }
}
