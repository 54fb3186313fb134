import type { Knex } from "knex";

/**
 * A revision is approved only with its approval record. A constraint trigger refuses any row of
 * `revisions` whose status is (or becomes) `approved` unless a review of that revision, in the same
 * organisation, holds decision = 'approve' (which the checks of 20261201002000 and 20261202700000
 * make complete: engineer, licence, time, verify code, facts). It is deferred to the end of the
 * transaction so the record and the status may be written in either order inside one transaction;
 * on its own, `UPDATE revisions SET status = 'approved'` fails when it commits.
 *
 * The record's trigger functions read tables by name. A role with TEMPORARY could shadow a table
 * with a temporary one of the same name (pg_temp is searched first unless named), so every such
 * function (every trigger function of the schema at this point) gets a fixed search path with
 * pg_temp last; db/lib/database-roles.ts also takes TEMPORARY away from the app role. A trigger
 * function added later should say `SET search_path = pg_catalog, public, pg_temp` itself.
 */
const TRIGGER_FUNCTIONS = `SELECT p.oid::regprocedure AS fn FROM pg_proc p
  WHERE p.pronamespace = 'public'::regnamespace AND p.prorettype = 'trigger'::regtype`;

export async function up(knex: Knex): Promise<void> {
  await knex.raw(`
    CREATE FUNCTION refuse_approval_without_record() RETURNS trigger LANGUAGE plpgsql
    SET search_path = pg_catalog, public, pg_temp AS $$
    BEGIN
      -- Deferred: read the row as it stands at commit, not as it was when the event was queued.
      IF EXISTS (SELECT 1 FROM public.revisions r WHERE r.id = NEW.id AND r.status = 'approved')
         AND NOT EXISTS (SELECT 1 FROM public.reviews v
                         WHERE v.revision_id = NEW.id AND v.organisation_id = NEW.organisation_id AND v.decision = 'approve') THEN
        RAISE EXCEPTION 'revision % cannot be approved without an engineer''s approval record', NEW.id
          USING ERRCODE = 'integrity_constraint_violation';
      END IF;
      RETURN NULL;
    END $$`);
  await knex.raw(`CREATE CONSTRAINT TRIGGER revisions_approval_needs_record AFTER INSERT OR UPDATE OF status ON revisions
    DEFERRABLE INITIALLY DEFERRED FOR EACH ROW WHEN (NEW.status = 'approved') EXECUTE FUNCTION refuse_approval_without_record()`);
  for (const { fn } of (await knex.raw(TRIGGER_FUNCTIONS)).rows) await knex.raw(`ALTER FUNCTION ${fn} SET search_path = pg_catalog, public, pg_temp`);
}

export async function down(knex: Knex): Promise<void> {
  for (const { fn } of (await knex.raw(TRIGGER_FUNCTIONS)).rows) await knex.raw(`ALTER FUNCTION ${fn} RESET search_path`);
  await knex.raw("DROP TRIGGER IF EXISTS revisions_approval_needs_record ON revisions");
  await knex.raw("DROP FUNCTION IF EXISTS refuse_approval_without_record()");
}
