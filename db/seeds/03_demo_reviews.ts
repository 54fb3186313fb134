import { randomBytes } from "node:crypto";
import type { Knex } from "knex";
import type { FactsSnapshot } from "../queries/reviews";
import { DEMO_ORG_ID } from "./01_demo_accounts";
import { DEMO_PROJECT_ID, DEMO_SLOPED_PROJECT_ID } from "./02_demo_projects";

/**
 * Something real for each demo role to open: the four-post alternative approved by the
 * demo engineer (its field spec ready for the demo installer, one hole already logged), and the
 * hillside design approved and then put on hold by a hole the crew found in rock. All invented.
 */
async function userId(knex: Knex, email: string): Promise<string> {
  return (await knex("users").where({ email }).first("id")).id;
}

async function facts(knex: Knex, projectId: string): Promise<FactsSnapshot> {
  const p = await knex("projects as p").leftJoin("criteria_cards as c", "c.id", "p.criteria_card_id").where("p.id", projectId)
    .first("p.name", "p.address", "p.state", "c.jurisdiction", "c.state as cState", "c.values", "c.sources");
  return { projectName: p.name, projectAddress: p.address, projectState: p.state, criteria: p.jurisdiction ? { jurisdiction: p.jurisdiction, state: p.cState, values: p.values, sources: p.sources } : null };
}

/** Approves the newest revision of a design as the demo engineer; returns that revision. */
async function approveNewest(knex: Knex, projectId: string, designName: string, comment: string) {
  const designer = await userId(knex, "designer@demo.pierwise.test");
  const engineer = await userId(knex, "engineer@demo.pierwise.test");
  const licence = await knex("engineer_licences").where({ user_id: engineer, state: "CO" }).first();
  const rev = await knex("revisions as r").join("designs as d", "d.id", "r.design_id").where({ "d.project_id": projectId, "d.name": designName })
    .orderBy("r.number", "desc").first("r.id", "r.design_id as designId", "r.result");
  await knex("revisions").where({ id: rev.id }).update({ status: "in_review" });
  const [review] = await knex("reviews").insert({
    revision_id: rev.id, organisation_id: DEMO_ORG_ID, engineer_id: engineer, submitted_by: designer, submitted_at: knex.raw("now() - interval '3 days'"),
  }).returning("id");
  // The comment first: once the row says "approve" the pin refuses new comments on it.
  await knex("review_comments").insert({ review_id: review.id, body: comment, author_id: engineer });
  await knex("reviews").where({ id: review.id }).update({
    decision: "approve", decided_by: engineer, decided_at: knex.raw("now() - interval '2 days'"),
    engineer_name: "Eli Engineer, P.E.", licence_number: licence.licence_number, licence_state: licence.state, licence_expires_on: licence.expires_on,
    overrides: "[]", facts_snapshot: JSON.stringify(await facts(knex, projectId)), verify_code: randomBytes(16).toString("base64url"),
  });
  await knex("revisions").where({ id: rev.id }).update({ status: "approved" });
  return rev as { id: string; designId: string; result: { footing: { diameterIn: number; depthIn: number } } };
}

export async function seed(knex: Knex): Promise<void> {
  const installer = await userId(knex, "installer@demo.pierwise.test");
  const approved = await approveNewest(knex, DEMO_PROJECT_ID, "Alternative on four posts", "Checked against the Juniper Flats criteria sheet; four 3½ in posts are fine.");
  await knex("as_built_entries").insert({
    revision_id: approved.id, organisation_id: DEMO_ORG_ID, post_id: "P1", measured_diameter_in: approved.result.footing.diameterIn,
    measured_depth_in: approved.result.footing.depthIn + 2, ground_found: "as_expected", notes: "Clean hole, dry.", recorded_by: installer,
  });

  const held = await approveNewest(knex, DEMO_SLOPED_PROJECT_ID, "Hillside array on four posts", "Slope survey attached to the project; approved as sized.");
  const [entry] = await knex("as_built_entries").insert({
    revision_id: held.id, organisation_id: DEMO_ORG_ID, post_id: "P2", measured_diameter_in: held.result.footing.diameterIn,
    measured_depth_in: Math.max(12, held.result.footing.depthIn - 18), ground_found: "rock", notes: "Hit solid rock; auger refused.", recorded_by: installer,
  }).returning("id");
  await knex("design_holds").insert({
    design_id: held.designId, organisation_id: DEMO_ORG_ID, revision_id: held.id, as_built_entry_id: entry.id, raised_by: installer,
    reason: `Hole P2 is ${Math.max(12, held.result.footing.depthIn - 18)} in deep, shallower than the ${held.result.footing.depthIn} in specified. Hole P2: rock found, which contradicts the presumed soil and frost depth the design assumed.`,
  });
}
