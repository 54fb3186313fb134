import type { Knex } from "knex";

/**
 * Issue 19: the projects list sorted by jurisdiction reads its page from an index, like its other
 * sorts. Sorting by the criteria card's jurisdiction joined every project of the organisation to
 * its card before the LIMIT; `projects.criteria_jurisdiction` is a copy of the card's
 * jurisdiction, kept by triggers:
 * - on projects (insert, or a change of the card, including the foreign key's SET NULL when the
 *   card is deleted, or of the copy itself): read from the card, so nothing a caller writes
 *   there sticks;
 * - on criteria_cards (the jurisdiction renamed): written to the card's projects.
 * Two indexes, because the list puts projects without a card last in both directions
 * (`NULLS LAST`), which one index read backwards cannot give.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.raw("ALTER TABLE projects ADD COLUMN criteria_jurisdiction text");
  await knex.raw(`UPDATE projects p SET criteria_jurisdiction = c.jurisdiction FROM criteria_cards c WHERE c.id = p.criteria_card_id`);

  await knex.raw(`
    CREATE FUNCTION copy_card_jurisdiction_onto_project() RETURNS trigger LANGUAGE plpgsql
    SET search_path = pg_catalog, public, pg_temp AS $$
    BEGIN
      NEW.criteria_jurisdiction := (SELECT c.jurisdiction FROM criteria_cards c WHERE c.id = NEW.criteria_card_id);
      RETURN NEW;
    END $$`);
  await knex.raw(`CREATE TRIGGER projects_copy_card_jurisdiction BEFORE INSERT OR UPDATE OF criteria_card_id, criteria_jurisdiction ON projects
    FOR EACH ROW EXECUTE FUNCTION copy_card_jurisdiction_onto_project()`);
  await knex.raw(`
    CREATE FUNCTION copy_card_jurisdiction_to_projects() RETURNS trigger LANGUAGE plpgsql
    SET search_path = pg_catalog, public, pg_temp AS $$
    BEGIN
      UPDATE projects SET criteria_jurisdiction = NEW.jurisdiction
      WHERE criteria_card_id = NEW.id AND criteria_jurisdiction IS DISTINCT FROM NEW.jurisdiction;
      RETURN NULL;
    END $$`);
  await knex.raw(`CREATE TRIGGER criteria_cards_copy_jurisdiction AFTER UPDATE OF jurisdiction ON criteria_cards
    FOR EACH ROW WHEN (OLD.jurisdiction IS DISTINCT FROM NEW.jurisdiction) EXECUTE FUNCTION copy_card_jurisdiction_to_projects()`);

  await knex.raw("CREATE INDEX projects_org_jurisdiction_id_idx ON projects (organisation_id, criteria_jurisdiction, id)");
  await knex.raw("CREATE INDEX projects_org_jurisdiction_desc_idx ON projects (organisation_id, criteria_jurisdiction DESC NULLS LAST, id DESC)");
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw("DROP TRIGGER IF EXISTS criteria_cards_copy_jurisdiction ON criteria_cards");
  await knex.raw("DROP FUNCTION IF EXISTS copy_card_jurisdiction_to_projects()");
  await knex.raw("DROP TRIGGER IF EXISTS projects_copy_card_jurisdiction ON projects");
  await knex.raw("DROP FUNCTION IF EXISTS copy_card_jurisdiction_onto_project()");
  await knex.raw("ALTER TABLE projects DROP COLUMN IF EXISTS criteria_jurisdiction");
}
