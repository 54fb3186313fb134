import type { Knex } from "knex";

/**
 * Issue 19, fifth pass (numbers in db/README.md).
 *
 * - `reviews.project_id`: the reviewed revision's project, kept with `design_id` and
 *   `revision_number` by the same BEFORE INSERT OR UPDATE trigger (whatever a caller sends is
 *   replaced by the revision's design's own project; a design never moves to another project). An
 *   outside engineer's queue then tells a review of an engaged project from the queue index alone
 *   (`project_id` against the engagements), where it first listed every design of every engaged
 *   project (one designs probe per engagement: ≈ 500 buffers for 100 engagements).
 * - The engineer's queue index carries `project_id` too (it replaces 20261204100000's, same keys).
 *   `reviews (project_id)` serves the new foreign key (tests/db/foreign-key-indexes.test.ts).
 * - `reviews (engineer_id, design_id) INCLUDE (id, organisation_id, project_id, submitted_at)
 *   WHERE decision = 'approve'`: the queue's on-hold rows are one index-only probe per held design
 *   (the engineer's approvals of it), where the planner hashed the held designs against every
 *   approval of the engineer (6,300 index entries at ×1000, growing with their history).
 * - `criteria_cards (organisation_id, state, jurisdiction, id)`: the criteria page is paged in
 *   its order (state, then jurisdiction), read from this index.
 * - `projects (organisation_id, updated_at, id)` replaces `(organisation_id, updated_at DESC, id)`:
 *   the projects list sorts `updated_at DESC, id DESC` (or both ascending), which the old index
 *   served in neither direction (an incremental sort of every row up to the page's end); read
 *   backward, the new one serves the default order, forward the other.
 *
 * The backfill UPDATE touches approval records, so the approval pin is lifted for it alone (as in
 * 20261204100000); it changes only the new column.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.raw("ALTER TABLE reviews ADD COLUMN project_id uuid REFERENCES projects (id) ON DELETE CASCADE");
  await knex.raw("ALTER TABLE reviews DISABLE TRIGGER reviews_pin_approval");
  await knex.raw("UPDATE reviews v SET project_id = d.project_id FROM designs d WHERE d.id = v.design_id");
  await knex.raw("ALTER TABLE reviews ENABLE TRIGGER reviews_pin_approval");
  await knex.raw("ALTER TABLE reviews ALTER COLUMN project_id SET NOT NULL");

  await knex.raw(`
    CREATE OR REPLACE FUNCTION copy_revision_onto_review() RETURNS trigger LANGUAGE plpgsql
    SET search_path = pg_catalog, public, pg_temp AS $$
    BEGIN
      SELECT r.design_id, r.number, d.project_id INTO NEW.design_id, NEW.revision_number, NEW.project_id
      FROM revisions r JOIN designs d ON d.id = r.design_id WHERE r.id = NEW.revision_id;
      RETURN NEW;
    END $$`);
  await knex.raw("DROP TRIGGER reviews_copy_revision ON reviews");
  await knex.raw(`CREATE TRIGGER reviews_copy_revision BEFORE INSERT OR UPDATE OF revision_id, design_id, revision_number, project_id ON reviews
    FOR EACH ROW EXECUTE FUNCTION copy_revision_onto_review()`);

  await knex.raw("CREATE INDEX reviews_project_idx ON reviews (project_id)");
  await knex.raw(`CREATE INDEX reviews_engineer_state_project_idx ON reviews (engineer_id, (decision IS NOT NULL), submitted_at, id)
    INCLUDE (organisation_id, decision, decided_at, revision_id, design_id, project_id)`);
  await knex.raw("DROP INDEX IF EXISTS reviews_engineer_state_idx");
  await knex.raw(`CREATE INDEX reviews_engineer_approvals_idx ON reviews (engineer_id, design_id)
    INCLUDE (id, organisation_id, project_id, submitted_at) WHERE decision = 'approve'`);
  await knex.raw("CREATE INDEX criteria_cards_org_order_idx ON criteria_cards (organisation_id, state, jurisdiction, id)");
  await knex.raw("CREATE INDEX projects_org_updated_id_idx ON projects (organisation_id, updated_at, id)");
  await knex.raw("DROP INDEX IF EXISTS projects_org_updated_idx");
  // Statistics for the new column and indexes before the first queue is planned (as 20261204100200).
  await knex.raw("ANALYZE reviews");
  await knex.raw("ANALYZE criteria_cards");
  await knex.raw("ANALYZE projects");
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw("CREATE INDEX IF NOT EXISTS projects_org_updated_idx ON projects (organisation_id, updated_at DESC, id)");
  await knex.raw("DROP INDEX IF EXISTS projects_org_updated_id_idx");
  await knex.raw("DROP INDEX IF EXISTS criteria_cards_org_order_idx");
  await knex.raw("DROP INDEX IF EXISTS reviews_engineer_approvals_idx");
  await knex.raw(`CREATE INDEX IF NOT EXISTS reviews_engineer_state_idx ON reviews (engineer_id, (decision IS NOT NULL), submitted_at, id)
    INCLUDE (organisation_id, decision, decided_at, revision_id, design_id)`);
  await knex.raw("DROP INDEX IF EXISTS reviews_engineer_state_project_idx");
  await knex.raw("DROP INDEX IF EXISTS reviews_project_idx");
  await knex.raw("DROP TRIGGER IF EXISTS reviews_copy_revision ON reviews");
  await knex.raw(`
    CREATE OR REPLACE FUNCTION copy_revision_onto_review() RETURNS trigger LANGUAGE plpgsql
    SET search_path = pg_catalog, public, pg_temp AS $$
    BEGIN
      SELECT r.design_id, r.number INTO NEW.design_id, NEW.revision_number FROM revisions r WHERE r.id = NEW.revision_id;
      RETURN NEW;
    END $$`);
  await knex.raw(`CREATE TRIGGER reviews_copy_revision BEFORE INSERT OR UPDATE OF revision_id, design_id, revision_number ON reviews
    FOR EACH ROW EXECUTE FUNCTION copy_revision_onto_review()`);
  await knex.raw("ALTER TABLE reviews DROP COLUMN IF EXISTS project_id");
}
