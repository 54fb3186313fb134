import type { Knex } from "knex";

/**
 * Issue 19, third pass: reads that looked through every revision of a design, or every review an
 * engineer can see, now read a page from one index (numbers in db/README.md).
 *
 * - `reviews.design_id` and `reviews.revision_number`: the design and number of the reviewed
 *   revision, copied onto the review when it is written (a BEFORE trigger on reviews, so whatever
 *   a caller sends is replaced by the revision's own values; a revision never moves to another
 *   design or changes its number). "The newest decided revision of this design, at or before
 *   number N" (the design page's pinned comments, the review page's "changes since the last
 *   review") is then one backward probe of `(design_id, revision_number)`, where it used to probe
 *   reviews for each earlier revision (1,000 at the largest benchmark design). A revision's status
 *   cannot mark "was decided": one with changes requested goes back to in review when resubmitted,
 *   and to draft when its engagement is revoked; the decision on the review row can. The copy sits
 *   on reviews, not revisions, because approved revisions are pinned against any UPDATE.
 * - The engineer's queue index now leads with engineer, then decided-or-not, then submission: the
 *   default order (waiting, on hold, decided; oldest submission first in each) reads each state
 *   in order straight from it and stops at the page. It carries design_id, so a review of an
 *   engaged project is told from the index too (no probe of its revision). It replaces the
 *   `(engineer_id, submitted_at, id)` one and still serves the engineer_id foreign key.
 *
 * The backfill UPDATE touches approval records, so the approval pin is lifted for it alone (as in
 * 20261202700000); it changes only the two new columns.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.raw(`ALTER TABLE reviews
    ADD COLUMN design_id uuid REFERENCES designs (id) ON DELETE CASCADE,
    ADD COLUMN revision_number integer`);
  await knex.raw("ALTER TABLE reviews DISABLE TRIGGER reviews_pin_approval");
  await knex.raw(`UPDATE reviews v SET design_id = r.design_id, revision_number = r.number
    FROM revisions r WHERE r.id = v.revision_id`);
  await knex.raw("ALTER TABLE reviews ENABLE TRIGGER reviews_pin_approval");
  await knex.raw("ALTER TABLE reviews ALTER COLUMN design_id SET NOT NULL, ALTER COLUMN revision_number SET NOT NULL");

  await knex.raw(`
    CREATE FUNCTION copy_revision_onto_review() RETURNS trigger LANGUAGE plpgsql
    SET search_path = pg_catalog, public, pg_temp AS $$
    BEGIN
      SELECT r.design_id, r.number INTO NEW.design_id, NEW.revision_number FROM revisions r WHERE r.id = NEW.revision_id;
      RETURN NEW;
    END $$`);
  await knex.raw(`CREATE TRIGGER reviews_copy_revision BEFORE INSERT OR UPDATE OF revision_id, design_id, revision_number ON reviews
    FOR EACH ROW EXECUTE FUNCTION copy_revision_onto_review()`);

  // Serves the design_id foreign key too. Undecided reviews of a design are few (one open per revision).
  await knex.raw("CREATE INDEX reviews_design_number_idx ON reviews (design_id, revision_number) INCLUDE (decision, decided_by)");
  await knex.raw(`CREATE INDEX reviews_engineer_state_idx ON reviews (engineer_id, (decision IS NOT NULL), submitted_at, id)
    INCLUDE (organisation_id, decision, decided_at, revision_id, design_id)`);
  await knex.raw("DROP INDEX IF EXISTS reviews_engineer_queue_idx");
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw(`CREATE INDEX IF NOT EXISTS reviews_engineer_queue_idx ON reviews (engineer_id, submitted_at, id)
    INCLUDE (organisation_id, decision, decided_at, revision_id)`);
  await knex.raw("DROP INDEX IF EXISTS reviews_engineer_state_idx");
  await knex.raw("DROP INDEX IF EXISTS reviews_design_number_idx");
  await knex.raw("DROP TRIGGER IF EXISTS reviews_copy_revision ON reviews");
  await knex.raw("DROP FUNCTION IF EXISTS copy_revision_onto_review()");
  await knex.raw("ALTER TABLE reviews DROP COLUMN IF EXISTS design_id, DROP COLUMN IF EXISTS revision_number");
}
