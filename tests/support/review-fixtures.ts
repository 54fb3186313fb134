/**
 * Fresh designs for the review tests: a project in Colorado (where the demo engineer is licensed)
 * with one design and a first revision sized by the engine, authored by the demo designer. Each
 * call makes its own design so tests do not depend on one another or on the demo seed.
 */
import crypto from "node:crypto";
import { sizeDesign, twoPostDesignInput, type DesignInputDraft } from "@/engine";
import { db } from "@/db/client";
import { DEMO_ORG_ID } from "@/db/seeds/01_demo_accounts";

export const DESIGNER = "designer@demo.pierwise.test";
export const ENGINEER = "engineer@demo.pierwise.test";
export const INSTALLER = "installer@demo.pierwise.test";
export const ADMIN = "admin@demo.pierwise.test";
export const OUTSIDER = "designer@other.pierwise.test";
/** Every demo person's password; approving is signed with it. */
export { DEMO_PASSWORD } from "@/db/seeds/01_demo_accounts";

export async function userId(email: string): Promise<string> {
  return (await db("users").where({ email }).first("id")).id;
}

export async function addRevision(designId: string, input: DesignInputDraft, authorEmail = DESIGNER): Promise<string> {
  const result = sizeDesign(input);
  const last = await db("revisions").where({ design_id: designId }).max("number as n").first();
  const [row] = await db("revisions")
    .insert({
      design_id: designId,
      organisation_id: DEMO_ORG_ID,
      number: Number(last?.n ?? 0) + 1,
      input: JSON.stringify(result.input),
      result: JSON.stringify(result),
      engine_version: result.engineVersion,
      content_hash: crypto.createHash("sha256").update(JSON.stringify(result.input)).digest("hex"),
      author_id: await userId(authorEmail),
    })
    .returning("id");
  return row.id;
}

export async function makeDesign(options: { state?: string; input?: DesignInputDraft; name?: string; projectName?: string; criteriaCardId?: string | null } = {}): Promise<{ projectId: string; designId: string; revisionId: string }> {
  const designer = await userId(DESIGNER);
  const [project] = await db("projects")
    .insert({
      organisation_id: DEMO_ORG_ID, name: options.projectName ?? `Review test site ${crypto.randomUUID().slice(0, 6)}`, address: "1 Test Lane (invented)",
      state: options.state ?? "CO", criteria_card_id: options.criteriaCardId ?? null, created_by: designer,
    })
    .returning("id");
  const [design] = await db("designs")
    .insert({ project_id: project.id, organisation_id: DEMO_ORG_ID, name: options.name ?? "Array A", created_by: designer })
    .returning("id");
  const revisionId = await addRevision(design.id, options.input ?? twoPostDesignInput);
  return { projectId: project.id, designId: design.id, revisionId };
}

/** Moves a fresh design's first revision into review, as if the designer had submitted it. */
export async function freshInReview(): Promise<{ designId: string; revisionId: string; reviewId: string }> {
  const d = await makeDesign();
  await db("revisions").where({ id: d.revisionId }).update({ status: "in_review" });
  const [review] = await db("reviews")
    .insert({ revision_id: d.revisionId, organisation_id: DEMO_ORG_ID, engineer_id: await userId(ENGINEER), submitted_by: await userId(DESIGNER) })
    .returning("id");
  return { ...d, reviewId: review.id };
}

/** A fresh approved revision, recorded as the demo engineer's approval (optionally with a letter key). */
export async function freshApproved(options: { letterKey?: string } = {}): Promise<{ designId: string; revisionId: string }> {
  const d = await freshInReview();
  await db("reviews").where({ id: d.reviewId }).update({
    decision: "approve", decided_by: await userId(ENGINEER), decided_at: db.fn.now(), engineer_name: "Eli Engineer, P.E.",
    licence_number: "PE-000000-DEMO", licence_state: "CO", licence_expires_on: "2030-12-31", letter_file_key: options.letterKey ?? null,
    verify_code: crypto.randomBytes(16).toString("base64url"), facts_snapshot: JSON.stringify({ projectName: "Review test site", projectAddress: "1 Test Lane (invented), Testville, CO", projectState: "CO", criteria: null }),
  });
  await db("revisions").where({ id: d.revisionId }).update({ status: "approved" });
  return d;
}

/** A fresh approved revision with one as-built entry (photo keys given) and, if asked, an open hold. */
export async function freshAsBuilt(options: { photoKeys?: string[]; hold?: boolean } = {}): Promise<{ designId: string; revisionId: string; entryId: string; holdId: string | null }> {
  const d = await freshApproved();
  const installer = await userId(INSTALLER);
  const [entry] = await db("as_built_entries")
    .insert({ revision_id: d.revisionId, organisation_id: DEMO_ORG_ID, post_id: "P1", measured_diameter_in: 30, measured_depth_in: 40, ground_found: "rock", photo_keys: JSON.stringify(options.photoKeys ?? []), recorded_by: installer })
    .returning("id");
  let holdId: string | null = null;
  if (options.hold) {
    const [hold] = await db("design_holds")
      .insert({ design_id: d.designId, organisation_id: DEMO_ORG_ID, revision_id: d.revisionId, as_built_entry_id: entry.id, reason: "Hole P1 is 40 in deep, shallower than specified.", raised_by: installer })
      .returning("id");
    holdId = hold.id;
  }
  return { ...d, entryId: entry.id, holdId };
}
