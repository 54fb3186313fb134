import type { Knex } from "knex";

/**
 * One Knex configuration for the app, the start script and the tests. The start script and the
 * test runner set DATABASE_URL to the cluster they started; nothing here starts a database.
 */
const config: Knex.Config = {
  client: "pg",
  connection: process.env.DATABASE_URL ?? "postgres://pierwise@127.0.0.1:54329/pierwise",
  // Idle connections are kept ten minutes (the pool's default is 30 s): a new server connection
  // costs a password exchange and plans its first statement on each table with cold catalog
  // caches (`npm run bench:db -- --statements`: ≈ 1.1 ms to plan the project's read on a cold
  // connection, ≈ 0.15 ms on a warm one), which a person coming back to a page after a minute
  // would otherwise pay on each of its reads.
  pool: { min: 0, max: Number(process.env.PIERWISE_DB_POOL ?? 10), idleTimeoutMillis: 600_000 },
  migrations: {
    directory: "./db/migrations",
    extension: "ts",
    loadExtensions: [".ts"],
    tableName: "knex_migrations",
  },
  seeds: {
    directory: "./db/seeds",
    extension: "ts",
    loadExtensions: [".ts"],
  },
};

export default config;
