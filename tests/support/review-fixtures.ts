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

export async function makeDesign(options: { state?: string; input?: DesignInputDraft; name?: string } = {}): Promise<{ projectId: string; designId: string; revisionId: string }> {
  const designer = await userId(DESIGNER);
  const [project] = await db("projects")
    .insert({ organisation_id: DEMO_ORG_ID, name: `Review test site ${crypto.randomUUID().slice(0, 6)}`, address: "1 Test Lane (invented)", state: options.state ?? "CO", created_by: designer })
    .returning("id");
  const [design] = await db("designs")
    .insert({ project_id: project.id, organisation_id: DEMO_ORG_ID, name: options.name ?? "Array A", created_by: designer })
    .returning("id");
  const revisionId = await addRevision(design.id, options.input ?? twoPostDesignInput);
  return { projectId: project.id, designId: design.id, revisionId };
}
