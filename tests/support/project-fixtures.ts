/**
 * Fresh projects, designs and uploads of the demo organisation for tests that change things
 * (the access matrix gives each caller its own).
 */
import crypto from "node:crypto";
import { putObject } from "@/app/_lib/storage";
import { objectKeys } from "@/app/_lib/uploads";
import { db } from "@/db/client";
import { createDesignWithRevision } from "@/db/queries/designs";
import { createProject } from "@/db/queries/projects";
import { DEMO_ORG_ID } from "@/db/seeds/01_demo_accounts";
import { designInputSchema, defaultDesignInput, ENGINE_VERSION, sizeParsedDesign } from "@/engine";

async function designerId(): Promise<string> {
  return (await db("users").where({ email: "designer@demo.pierwise.test" }).first("id")).id;
}

export async function freshProject(name = `Fixture project ${crypto.randomUUID().slice(0, 8)}`): Promise<string> {
  return createProject(DEMO_ORG_ID, await designerId(), { name, address: "", state: "CO", latitude: null, longitude: null, notes: "", criteriaCardId: null });
}

export const demoInput = () => designInputSchema.parse(defaultDesignInput);

export async function freshDesign(): Promise<{ projectId: string; designId: string; revisionId: string }> {
  const projectId = await freshProject();
  const input = demoInput();
  const created = await createDesignWithRevision({ projectId, organisationId: DEMO_ORG_ID, name: "Fixture design", authorId: await designerId(), input, result: sizeParsedDesign(input), engineVersion: ENGINE_VERSION, note: "fixture" });
  return { projectId, ...created };
}

/** A stored PDF upload on a fresh project. */
export async function freshFile(): Promise<{ projectId: string; fileId: string }> {
  const projectId = await freshProject();
  const keys = objectKeys(DEMO_ORG_ID, projectId);
  await putObject(keys.original, new TextEncoder().encode("%PDF-1.4\n%%EOF\n"), "application/pdf");
  await db("project_files").insert({ id: keys.fileId, project_id: projectId, organisation_id: DEMO_ORG_ID, kind: "document", original_name: "fixture.pdf", content_type: "application/pdf", size_bytes: 15, object_key: keys.original, uploaded_by: await designerId() });
  return { projectId, fileId: keys.fileId };
}
