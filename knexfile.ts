import type { Knex } from "knex";

/**
 * One Knex configuration for the app, the start script and the tests. The start script and the
 * test runner set DATABASE_URL to the cluster they started; nothing here starts a database.
 */
const config: Knex.Config = {
  client: "pg",
  connection: process.env.DATABASE_URL ?? "postgres://pierwise@127.0.0.1:54329/pierwise",
  pool: { min: 0, max: Number(process.env.PIERWISE_DB_POOL ?? 10) },
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
