import type { Knex } from "knex";

/**
 * Every list reads a page, not the organisation (issue 19; numbers from `npm run bench:db` in
 * db/README.md):
 * - an index behind every foreign key, so deleting a user or a design never scans a table;
 * - an index for each list's filter and sort, organisation first;
 * - the footing headline of a revision (diameter, depth, pass, number of holes) as stored
 *   generated columns: computed once when the row is written, never re-read from the result JSON
 *   by a list. Generated columns are filled by the table rewrite of ALTER TABLE, which fires no
 *   row trigger, so the approval pin stays untouched and approved rows are not "updated";
 * - projects.design_count, kept by a trigger on designs, so sorting by it reads no designs;
 * - designs.approved_revision_id / approved_at, kept by a trigger on revisions: the design's
 *   newest approved revision, so the field list pages current specs by an index and tells a
 *   superseded one without looking through the other revisions;
 * - trigram indexes (pg_trgm, with btree_gin so the organisation is part of the same index) for
 *   the project search. Both extensions ship with Debian's postgresql package and are trusted,
 *   so the database owner may create them.
 */

const FK_INDEXES: [table: string, columns: string][] = [
  ["memberships", "user_id"],
  ["invitations", "organisation_id"],
  ["invitations", "invited_by"],
  ["password_resets", "user_id"],
  ["audit_events", "actor_user_id"],
  ["criteria_cards", "created_by"],
  ["projects", "criteria_card_id"],
  ["projects", "created_by"],
  ["designs", "organisation_id"],
  ["designs", "created_by"],
  ["revisions", "author_id"],
  ["revisions", "organisation_id, status"],
  ["project_files", "organisation_id"],
  ["project_files", "uploaded_by"],
  ["reviews", "engineer_id"],
  ["reviews", "submitted_by"],
  ["reviews", "decided_by"],
  ["review_comments", "author_id"],
  ["as_built_entries", "organisation_id"],
  ["as_built_entries", "recorded_by"],
  ["design_holds", "organisation_id"],
  ["design_holds", "revision_id"],
  ["design_holds", "as_built_entry_id"],
  ["design_holds", "raised_by"],
  ["design_holds", "cleared_by"],
];

const indexName = (table: string, columns: string) => `${table}_${columns.replace(/\W+/g, "_")}_idx`;

export async function up(knex: Knex): Promise<void> {
  await knex.raw("CREATE EXTENSION IF NOT EXISTS pg_trgm");
  await knex.raw("CREATE EXTENSION IF NOT EXISTS btree_gin");

  // Footing headline as columns; the CASE keeps a result without a posts array from failing the insert.
  await knex.raw(`ALTER TABLE revisions
    ADD COLUMN footing_diameter_in double precision GENERATED ALWAYS AS ((result->'footing'->>'diameterIn')::double precision) STORED,
    ADD COLUMN footing_depth_in double precision GENERATED ALWAYS AS ((result->'footing'->>'depthIn')::double precision) STORED,
    ADD COLUMN footing_pass boolean GENERATED ALWAYS AS ((result->'footing'->>'pass')::boolean) STORED,
    ADD COLUMN field_post_count integer GENERATED ALWAYS AS (
      CASE WHEN jsonb_typeof(result->'field'->'posts') = 'array' THEN jsonb_array_length(result->'field'->'posts') END) STORED`);

  for (const [table, columns] of FK_INDEXES) await knex.raw(`CREATE INDEX ${indexName(table, columns)} ON ${table} (${columns})`);

  // Lists: filter first, then the sort, then the id as the tie-break a keyset page needs.
  await knex.raw("CREATE INDEX projects_org_updated_idx ON projects (organisation_id, updated_at DESC, id)");
  await knex.raw("CREATE INDEX projects_org_state_idx ON projects (organisation_id, state, name)");
  await knex.raw("CREATE INDEX projects_search_trgm_idx ON projects USING gin (organisation_id, (name || ' ' || address || ' ' || state) gin_trgm_ops)");
  await knex.raw("CREATE INDEX criteria_cards_jurisdiction_trgm_idx ON criteria_cards USING gin (organisation_id, jurisdiction gin_trgm_ops)");
  await knex.raw("DROP INDEX IF EXISTS audit_events_organisation_id_at_index");
  await knex.raw("CREATE INDEX audit_events_org_at_id_idx ON audit_events (organisation_id, at, id)");
  // Revisions of a design, newest first (the list's default) and by footing depth.
  await knex.raw("CREATE INDEX revisions_design_depth_idx ON revisions (design_id, footing_depth_in)");
  // "Is there a newer approved revision of this design?" reads only approved rows.
  await knex.raw("CREATE INDEX revisions_design_approved_idx ON revisions (design_id, number) WHERE status = 'approved'");
  // The review queues: waiting for an engineer, submitted by a person, recently decided.
  await knex.raw("CREATE INDEX reviews_open_queue_idx ON reviews (organisation_id, engineer_id, submitted_at) WHERE decision IS NULL");
  await knex.raw("CREATE INDEX reviews_submitted_queue_idx ON reviews (organisation_id, submitted_by, submitted_at DESC)");
  await knex.raw("CREATE INDEX reviews_decided_queue_idx ON reviews (organisation_id, decided_at DESC) WHERE decision IS NOT NULL");
  await knex.raw("CREATE INDEX reviews_approvals_idx ON reviews (organisation_id, decided_at DESC) WHERE decision = 'approve'");
  await knex.raw("CREATE INDEX design_holds_open_idx ON design_holds (design_id) WHERE cleared_at IS NULL");

  // Design count per project, kept by a trigger so sorting by it reads no designs.
  await knex.raw("ALTER TABLE projects ADD COLUMN design_count integer NOT NULL DEFAULT 0");
  await knex.raw("UPDATE projects p SET design_count = c.n FROM (SELECT project_id, count(*)::int AS n FROM designs GROUP BY project_id) c WHERE c.project_id = p.id");
  await knex.raw("CREATE INDEX projects_org_design_count_idx ON projects (organisation_id, design_count)");
  await knex.raw(`
    CREATE FUNCTION count_project_designs() RETURNS trigger LANGUAGE plpgsql AS $$
    BEGIN
      IF TG_OP = 'INSERT' THEN
        UPDATE projects SET design_count = design_count + 1 WHERE id = NEW.project_id;
      ELSIF TG_OP = 'DELETE' THEN
        UPDATE projects SET design_count = design_count - 1 WHERE id = OLD.project_id;
      ELSIF NEW.project_id IS DISTINCT FROM OLD.project_id THEN
        UPDATE projects SET design_count = design_count - 1 WHERE id = OLD.project_id;
        UPDATE projects SET design_count = design_count + 1 WHERE id = NEW.project_id;
      END IF;
      RETURN NULL;
    END $$`);
  await knex.raw(`CREATE TRIGGER designs_count_in_project AFTER INSERT OR DELETE OR UPDATE OF project_id ON designs
    FOR EACH ROW EXECUTE FUNCTION count_project_designs()`);

  // The design's newest approved revision and when it was approved (for the field list).
  await knex.raw(`ALTER TABLE designs
    ADD COLUMN approved_revision_id uuid REFERENCES revisions(id) ON DELETE SET NULL,
    ADD COLUMN approved_at timestamptz`);
  await knex.raw(`UPDATE designs d SET approved_revision_id = a.id, approved_at = a.approved_at FROM (
      SELECT DISTINCT ON (r.design_id) r.design_id, r.id,
             coalesce((SELECT max(v.decided_at) FROM reviews v WHERE v.revision_id = r.id AND v.decision = 'approve'), r.created_at) AS approved_at
      FROM revisions r WHERE r.status = 'approved' ORDER BY r.design_id, r.number DESC) a
    WHERE a.design_id = d.id`);
  await knex.raw("CREATE INDEX designs_approved_revision_idx ON designs (approved_revision_id)");
  await knex.raw("CREATE INDEX designs_org_approved_idx ON designs (organisation_id, approved_at DESC) WHERE approved_revision_id IS NOT NULL");
  await knex.raw(`
    CREATE FUNCTION note_design_approval() RETURNS trigger LANGUAGE plpgsql AS $$
    BEGIN
      UPDATE designs d SET approved_revision_id = NEW.id, approved_at = now()
      WHERE d.id = NEW.design_id
        AND (d.approved_revision_id IS NULL OR (SELECT number FROM revisions WHERE id = d.approved_revision_id) < NEW.number);
      RETURN NULL;
    END $$`);
  await knex.raw(`CREATE TRIGGER revisions_note_approval AFTER INSERT OR UPDATE OF status ON revisions
    FOR EACH ROW WHEN (NEW.status = 'approved') EXECUTE FUNCTION note_design_approval()`);
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw("DROP TRIGGER IF EXISTS revisions_note_approval ON revisions");
  await knex.raw("DROP FUNCTION IF EXISTS note_design_approval()");
  await knex.raw("ALTER TABLE designs DROP COLUMN IF EXISTS approved_revision_id, DROP COLUMN IF EXISTS approved_at");
  await knex.raw("DROP TRIGGER IF EXISTS designs_count_in_project ON designs");
  await knex.raw("DROP FUNCTION IF EXISTS count_project_designs()");
  await knex.raw("ALTER TABLE projects DROP COLUMN IF EXISTS design_count");
  for (const name of [
    "projects_org_updated_idx", "projects_org_state_idx", "projects_search_trgm_idx", "criteria_cards_jurisdiction_trgm_idx",
    "audit_events_org_at_id_idx", "revisions_design_depth_idx", "revisions_design_approved_idx", "reviews_open_queue_idx",
    "reviews_submitted_queue_idx", "reviews_decided_queue_idx", "reviews_approvals_idx", "design_holds_open_idx",
    ...FK_INDEXES.map(([t, c]) => indexName(t, c)),
  ]) await knex.raw(`DROP INDEX IF EXISTS ${name}`);
  await knex.raw("CREATE INDEX IF NOT EXISTS audit_events_organisation_id_at_index ON audit_events (organisation_id, at)");
  await knex.raw(`ALTER TABLE revisions DROP COLUMN IF EXISTS footing_diameter_in, DROP COLUMN IF EXISTS footing_depth_in,
    DROP COLUMN IF EXISTS footing_pass, DROP COLUMN IF EXISTS field_post_count`);
}
