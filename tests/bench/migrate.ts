/**
 * Migrations and seeds of one database, run in a child process by tests that cannot load .ts
 * migrations themselves (vitest's loader). Usage:
 *   tsx tests/bench/migrate.ts <database-url> latest
 *   tsx tests/bench/migrate.ts <database-url> except <file-name-regex> [seed]   every pending migration but the matching ones
 */
import knex from "knex";
import knexConfig from "../../knexfile";

const [url, mode, pattern, seed] = process.argv.slice(2);
const migrator = knex({ ...knexConfig, connection: url, pool: { min: 0, max: 1 } });
try {
  if (mode === "latest") {
    await migrator.migrate.latest();
  } else if (mode === "except") {
    const skip = new RegExp(pattern);
    const [, pending] = (await migrator.migrate.list()) as [unknown, { file: string }[]];
    for (const m of pending.filter((p) => !skip.test(p.file))) await migrator.migrate.up({ name: m.file });
    if (seed === "seed") await migrator.seed.run();
  } else {
    throw new Error(`unknown mode ${mode}`);
  }
} finally {
  await migrator.destroy();
}
