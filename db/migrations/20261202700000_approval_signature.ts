import type { Knex } from "knex";

/**
 * An approval that an inspector can trust. On `reviews` (the approval record, pinned by the
 * trigger of 20261201002000 once decision = 'approve'):
 * - `overrides`: the engineer's reason for each failing check approved anyway, [{ checkId, title, ratio, reason }];
 * - `facts_snapshot`: the project facts the approval was given (name, address, state, criteria card
 *   with sources and dates), so later project edits never change an approved record;
 * - `verify_code`: an unguessable code for the public /verify/<code> page.
 * All three are written in the same UPDATE that records the decision, so the pin covers them.
 * On `organisations`: `time_zone` (IANA name) for dates in words on reports and pages.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable("reviews", (t) => {
    t.jsonb("overrides").notNullable().defaultTo("[]");
    t.jsonb("facts_snapshot");
    t.text("verify_code").unique();
  });
  await knex.schema.alterTable("organisations", (t) => {
    t.text("time_zone").notNullable().defaultTo("America/Denver");
  });
  // Approvals made before this migration get a code and a snapshot of the facts as they stand now
  // (the best record there is). The pin trigger is lifted for this one backfill only.
  await knex.raw("ALTER TABLE reviews DISABLE TRIGGER reviews_pin_approval");
  await knex.raw(`
    UPDATE reviews v SET
      verify_code = replace(gen_random_uuid()::text, '-', ''),
      facts_snapshot = jsonb_build_object(
        'projectName', p.name, 'projectAddress', p.address, 'projectState', p.state,
        'criteria', CASE WHEN c.id IS NULL THEN NULL ELSE jsonb_build_object('jurisdiction', c.jurisdiction, 'state', c.state, 'values', c.values, 'sources', c.sources) END)
    FROM revisions r JOIN designs d ON d.id = r.design_id JOIN projects p ON p.id = d.project_id
      LEFT JOIN criteria_cards c ON c.id = p.criteria_card_id
    WHERE r.id = v.revision_id AND v.decision = 'approve'`);
  await knex.raw("ALTER TABLE reviews ENABLE TRIGGER reviews_pin_approval");
  await knex.raw(`ALTER TABLE reviews ADD CONSTRAINT reviews_approval_verifiable CHECK (
    decision IS DISTINCT FROM 'approve' OR (verify_code IS NOT NULL AND facts_snapshot IS NOT NULL))`);
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw("ALTER TABLE reviews DROP CONSTRAINT IF EXISTS reviews_approval_verifiable");
  await knex.schema.alterTable("organisations", (t) => t.dropColumn("time_zone"));
  await knex.raw("ALTER TABLE reviews DISABLE TRIGGER reviews_pin_approval");
  await knex.schema.alterTable("reviews", (t) => {
    t.dropColumn("overrides");
    t.dropColumn("facts_snapshot");
    t.dropColumn("verify_code");
  });
  await knex.raw("ALTER TABLE reviews ENABLE TRIGGER reviews_pin_approval");
}
