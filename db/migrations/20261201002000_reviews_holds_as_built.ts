import type { Knex } from "knex";

/**
 * Engineer review, holds and the as-built log. Approval pins a revision: a trigger refuses any
 * UPDATE or DELETE of an approved revision, of its approval record and of that record's comments,
 * whatever the app (or anyone with SQL) does. Status moves (draft → in_review → approved |
 * changes_requested) are UPDATEs of rows that are not yet approved, which the trigger allows.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.raw("CREATE TYPE review_decision AS ENUM ('approve', 'request_changes')");
  await knex.raw("CREATE TYPE ground_found AS ENUM ('as_expected', 'rock', 'water', 'fill', 'caving')");

  // One submission of one revision to one engineer, and (once made) the decision on it. The
  // licence columns copy the licence as it stood at the decision, so the record outlives renewals.
  await knex.schema.createTable("reviews", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("revision_id").notNullable().references("revisions.id").onDelete("CASCADE");
    t.uuid("organisation_id").notNullable().references("organisations.id").onDelete("CASCADE");
    t.uuid("engineer_id").notNullable().references("users.id");
    t.uuid("submitted_by").notNullable().references("users.id");
    t.timestamp("submitted_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.specificType("decision", "review_decision");
    t.uuid("decided_by").references("users.id");
    t.timestamp("decided_at", { useTz: true });
    t.text("engineer_name");
    t.text("licence_number");
    t.string("licence_state", 2);
    t.date("licence_expires_on");
    t.text("letter_file_key");
    t.index(["revision_id"]);
    t.index(["organisation_id", "engineer_id"]);
  });
  await knex.raw(`ALTER TABLE reviews ADD CONSTRAINT reviews_decision_complete CHECK (
    decision IS NULL OR (decided_by IS NOT NULL AND decided_at IS NOT NULL AND engineer_name IS NOT NULL))`);
  await knex.raw(`ALTER TABLE reviews ADD CONSTRAINT reviews_approval_licensed CHECK (
    decision IS DISTINCT FROM 'approve' OR (licence_number IS NOT NULL AND licence_state IS NOT NULL))`);
  // At most one open (undecided) submission per revision.
  await knex.raw("CREATE UNIQUE INDEX reviews_one_open_per_revision ON reviews (revision_id) WHERE decision IS NULL");

  // The engineer's comments on a review, optionally pinned to an input field path ("site.windSpeedMph").
  await knex.schema.createTable("review_comments", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("review_id").notNullable().references("reviews.id").onDelete("CASCADE");
    t.text("field_path");
    t.text("body").notNullable();
    t.uuid("author_id").notNullable().references("users.id");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["review_id"]);
  });

  // What the crew measured at each hole of an approved revision, with photos in object storage.
  await knex.schema.createTable("as_built_entries", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("revision_id").notNullable().references("revisions.id").onDelete("CASCADE");
    t.uuid("organisation_id").notNullable().references("organisations.id").onDelete("CASCADE");
    t.text("post_id").notNullable();
    t.double("measured_diameter_in").notNullable();
    t.double("measured_depth_in").notNullable();
    t.specificType("ground_found", "ground_found").notNullable();
    t.text("notes").notNullable().defaultTo("");
    t.jsonb("photo_keys").notNullable().defaultTo("[]");
    t.uuid("recorded_by").notNullable().references("users.id");
    t.timestamp("recorded_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["revision_id", "post_id"]);
  });

  // A stop on a design: raised when an as-built entry contradicts the approved spec, cleared only
  // by an engineer. The open hold shows on every screen of that design.
  await knex.schema.createTable("design_holds", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("design_id").notNullable().references("designs.id").onDelete("CASCADE");
    t.uuid("organisation_id").notNullable().references("organisations.id").onDelete("CASCADE");
    t.uuid("revision_id").references("revisions.id").onDelete("SET NULL");
    t.uuid("as_built_entry_id").references("as_built_entries.id").onDelete("SET NULL");
    t.text("reason").notNullable();
    t.uuid("raised_by").notNullable().references("users.id");
    t.timestamp("raised_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.uuid("cleared_by").references("users.id");
    t.timestamp("cleared_at", { useTz: true });
    t.text("clear_note");
    t.index(["design_id"]);
  });

  await knex.raw(`
    CREATE FUNCTION refuse_change_to_approved_revision() RETURNS trigger LANGUAGE plpgsql AS $$
    BEGIN
      IF OLD.status = 'approved' THEN
        RAISE EXCEPTION 'revision % is approved and pinned: it cannot be changed or deleted; save a new revision instead', OLD.id
          USING ERRCODE = 'integrity_constraint_violation';
      END IF;
      RETURN CASE WHEN TG_OP = 'DELETE' THEN OLD ELSE NEW END;
    END $$`);
  await knex.raw(`CREATE TRIGGER revisions_pin_approved BEFORE UPDATE OR DELETE ON revisions
    FOR EACH ROW EXECUTE FUNCTION refuse_change_to_approved_revision()`);

  await knex.raw(`
    CREATE FUNCTION refuse_change_to_approval() RETURNS trigger LANGUAGE plpgsql AS $$
    BEGIN
      IF OLD.decision = 'approve' THEN
        RAISE EXCEPTION 'review % is an approval record: it cannot be changed or deleted', OLD.id
          USING ERRCODE = 'integrity_constraint_violation';
      END IF;
      RETURN CASE WHEN TG_OP = 'DELETE' THEN OLD ELSE NEW END;
    END $$`);
  await knex.raw(`CREATE TRIGGER reviews_pin_approval BEFORE UPDATE OR DELETE ON reviews
    FOR EACH ROW EXECUTE FUNCTION refuse_change_to_approval()`);

  // An approval's comments are part of the record too (new comments on it are refused as well).
  await knex.raw(`
    CREATE FUNCTION refuse_change_to_approval_comment() RETURNS trigger LANGUAGE plpgsql AS $$
    DECLARE parent review_decision;
    BEGIN
      SELECT decision INTO parent FROM reviews WHERE id = CASE WHEN TG_OP = 'INSERT' THEN NEW.review_id ELSE OLD.review_id END;
      IF parent = 'approve' THEN
        RAISE EXCEPTION 'comments of an approval record cannot be added, changed or deleted'
          USING ERRCODE = 'integrity_constraint_violation';
      END IF;
      RETURN CASE WHEN TG_OP = 'DELETE' THEN OLD ELSE NEW END;
    END $$`);
  await knex.raw(`CREATE TRIGGER review_comments_pin_approval BEFORE INSERT OR UPDATE OR DELETE ON review_comments
    FOR EACH ROW EXECUTE FUNCTION refuse_change_to_approval_comment()`);
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw("DROP TRIGGER IF EXISTS review_comments_pin_approval ON review_comments");
  await knex.raw("DROP TRIGGER IF EXISTS reviews_pin_approval ON reviews");
  await knex.raw("DROP TRIGGER IF EXISTS revisions_pin_approved ON revisions");
  for (const table of ["design_holds", "as_built_entries", "review_comments", "reviews"]) await knex.schema.dropTableIfExists(table);
  await knex.raw("DROP FUNCTION IF EXISTS refuse_change_to_approval_comment()");
  await knex.raw("DROP FUNCTION IF EXISTS refuse_change_to_approval()");
  await knex.raw("DROP FUNCTION IF EXISTS refuse_change_to_approved_revision()");
  await knex.raw("DROP TYPE IF EXISTS ground_found");
  await knex.raw("DROP TYPE IF EXISTS review_decision");
}
