import type { Knex } from "knex";
import crypto from "node:crypto";
import { hashPassword } from "../password";
import { DEMO_ORG_ID, DEMO_PASSWORD } from "./01_demo_accounts";
import { designInputSchema, ENGINE_VERSION, sizeParsedDesign } from "../../engine";
import { createRevision } from "../queries/revisions";
import { DEMO_SLOPED_PROJECT_ID } from "./02_demo_projects";

/**
 * An invented engineering firm outside the demo contractor, whose engineer is engaged (and has
 * accepted) on one demo project, with that project's newest revision waiting for their review.
 * Every name and the licence number are made up.
 */
export const OUTSIDE_FIRM_ID = "0f5e1c2a-0000-4000-8000-000000000003";
export const OUTSIDE_ENGINEER_EMAIL = "engineer@outside.pierwise.test";
export const OUTSIDE_ENGAGED_PROJECT_ID = DEMO_SLOPED_PROJECT_ID;

export async function seed(knex: Knex): Promise<void> {
  await knex("organisations").insert({ id: OUTSIDE_FIRM_ID, name: "Example Structural Review Partners (demo)" });
  const [engineer] = await knex("users")
    .insert({ email: OUTSIDE_ENGINEER_EMAIL, name: "Olive Outside, P.E.", password_hash: await hashPassword(DEMO_PASSWORD) })
    .returning("id");
  await knex("memberships").insert({ organisation_id: OUTSIDE_FIRM_ID, user_id: engineer.id, roles: knex.raw("?::member_role[]", ["{admin,engineer}"]) });
  await knex("engineer_licences").insert({ user_id: engineer.id, licence_number: "PE-990000-DEMO", state: "CO", expires_on: "2030-12-31" });

  const designer = (await knex("users").where({ email: "designer@demo.pierwise.test" }).first("id")).id;
  await knex("engagements").insert({
    organisation_id: DEMO_ORG_ID, project_id: OUTSIDE_ENGAGED_PROJECT_ID, email: OUTSIDE_ENGINEER_EMAIL,
    message: "Hillside cabin site; the slope survey is in the uploads.", status: "accepted", engineer_user_id: engineer.id,
    // The demo link is never e-mailed; its token is random and thrown away.
    token_hash: crypto.createHash("sha256").update(crypto.randomBytes(32)).digest("hex"),
    invited_by: designer, responded_at: knex.fn.now(),
  });

  // The hillside design was approved and then put on hold (03_demo_reviews.ts): its revision 3, with
  // wider holes, waits for the outside engineer's review.
  const latest = await knex("revisions as r").join("designs as d", "d.id", "r.design_id")
    .where("d.project_id", OUTSIDE_ENGAGED_PROJECT_ID).orderBy("r.number", "desc").first("r.id", "r.design_id as designId", "r.input");
  const input = designInputSchema.parse(typeof latest.input === "string" ? JSON.parse(latest.input) : latest.input);
  // The hole diameter may be "auto" (sized by the engine): then take the diameter it chose.
  const diameterIn = input.posts.holeDiameterIn === "auto" ? sizeParsedDesign(input).footing.diameterIn : input.posts.holeDiameterIn;
  const wider = designInputSchema.parse({ ...input, posts: { ...input.posts, holeDiameterIn: diameterIn + 6 } });
  const revision = await createRevision({
    designId: latest.designId, organisationId: DEMO_ORG_ID, baseRevisionId: latest.id, authorId: designer,
    input: wider, result: sizeParsedDesign(wider), engineVersion: ENGINE_VERSION, note: "Holes 6 in wider after the shallow P2 hole; for the outside engineer's review.",
  }, knex);
  await knex("revisions").where({ id: revision.id }).update({ status: "in_review" });
  await knex("reviews").insert({ revision_id: revision.id, organisation_id: DEMO_ORG_ID, engineer_id: engineer.id, submitted_by: designer });
}
