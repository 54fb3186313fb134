import knex from "knex";
import config from "@/knexfile";

/**
 * The schema owner's connection, for the few tests that create or drop tables (migrations of their
 * own, catalog probes). The app and every other test connect as the row-only app role (DATABASE_URL).
 * tests/run.ts passes the owner's URL; the app server never gets it.
 */
export const ownerUrl = process.env.PIERWISE_OWNER_DATABASE_URL ?? "";
if (!ownerUrl) throw new Error("PIERWISE_OWNER_DATABASE_URL is not set: run the tests through `npm test`.");

export const ownerDb = knex({ ...config, connection: ownerUrl, pool: { min: 0, max: 2 } });
