import knex, { type Knex } from "knex";
import knexConfig from "../../knexfile";
import { StartupError } from "./fail";

/**
 * Applies pending migrations and returns how many ran. knex runs all pending migrations of one call
 * in a single transaction, so a failure leaves the database as it was; the message names the
 * migration, PostgreSQL's own error line, the database and the cluster folder, and the fix.
 * `overrides` are only for tests, to point it at migrations of their own.
 */
export async function migrateToLatest(databaseUrl: string, clusterDir: string, overrides: Partial<Knex.MigratorConfig> = {}): Promise<number> {
  let current: string | null = null;
  const migrator = knex({
    ...knexConfig,
    connection: databaseUrl,
    // knex prints its own two lines about a failed migration; the one message below says it all.
    log: { warn: () => {}, error: () => {}, deprecate: () => {}, debug: () => {} },
    migrations: {
      ...knexConfig.migrations,
      ...overrides,
      beforeEach: async (_trx: unknown, migrations: { file?: string; name?: string }[]) => {
        current = migrations[0]?.file ?? migrations[0]?.name ?? null;
      },
    } as typeof knexConfig.migrations,
  });
  const where = `database ${databaseName(databaseUrl)} (cluster folder ${clusterDir})`;
  try {
    const [, applied] = (await migrator.migrate.latest()) as [number, string[]];
    return applied.length;
  } catch (error) {
    const message = error instanceof Error ? error.message : String(error);
    const missing = /migration directory is corrupt, the following files are missing: (.*)$/.exec(message);
    if (missing) {
      throw new StartupError(
        `the ${where} has migrations this checkout does not have (${missing[1]}): it was last used by a newer Pierwise. ` +
          `Fix: update this checkout (git pull) before starting; nothing was changed.`,
      );
    }
    if (/already locked|take lock/i.test(message)) {
      throw new StartupError(
        `the ${where} is being migrated by another process (its knex_migrations_lock is taken). ` +
          `Fix: wait for it and start again; if none is running (one was killed mid-way), run ` +
          `\`node --import tsx node_modules/knex/bin/cli.js --knexfile knexfile.ts migrate:unlock\` with DATABASE_URL set; nothing was changed.`,
      );
    }
    if (!current) {
      throw new StartupError(`could not read the migration state of the ${where}: ${postgresLine(error)}. Fix: check that PostgreSQL is up and DATABASE_URL is right; nothing was changed.`);
    }
    throw new StartupError(
      `migration ${current} failed: ${postgresLine(error)}. Folder: ${clusterDir}, ${where.replace(/ \(cluster folder .*\)$/, "")}. ` +
        `Fix: every migration of this start was rolled back, so the data is as it was; correct that migration (or update this checkout) and start again.`,
    );
  } finally {
    await migrator.destroy();
  }
}

/** PostgreSQL's own words: knex prefixes the SQL ("<sql> - <message>"); the driver keeps the severity apart. */
export function postgresLine(error: unknown): string {
  if (!(error instanceof Error)) return String(error);
  const severity = (error as { severity?: string }).severity;
  const text = error.message.split(" - ").at(-1)!.trim();
  return severity ? `${severity}:  ${text}` : text;
}

function databaseName(url: string): string {
  try {
    const parsed = new URL(url);
    return `${parsed.pathname.slice(1)} on ${parsed.host}`;
  } catch {
    return "(unparsable DATABASE_URL)";
  }
}
