import "server-only";
import { createDesignWithRevision, getDesign, type Design } from "@/db/queries/designs";
import { getRevision } from "@/db/queries/revisions";
import { designInputSchema, ENGINE_VERSION, startingSize } from "@/engine";
import type { CurrentUser } from "../auth";
import { startingInput } from "../design-defaults";
import { assertCanWrite, cardFor, computeResult, designFor, projectFor, saveRevision as insertRevision, type DesignRevision } from "../designs";
import { designCreateSchema, revisionCreateSchema } from "../schemas/project";
import type { Body } from "./input";
import { startingNote } from "@/components/format/revision-note";

/** How a design made from the card was sized: what changed and, when nothing passes, what to change. */
export interface StartingSizing {
  pass: boolean;
  changes: string[];
  advice: string[];
}

/**
 * A new design with its revision 1: from `input` when given (API), else from the defaults with the
 * project's criteria card applied and sized by the engine (the smallest passing pipe in the hole
 * "size it for me" picks, engine/options/starting-size.ts), so it opens passing, or its note says
 * what to change. Without a note, revision 1 says where it started from and how it was sized.
 */
export async function createDesign(user: CurrentUser, projectId: string, body: Body): Promise<{ design: Design; revisionId: string; sizing: StartingSizing | null }> {
  const project = await projectFor(user, projectId);
  assertCanWrite(user);
  const fields = designCreateSchema.parse(await body());
  const card = await cardFor(user, project.criteriaCardId);
  const start = fields.input ? null : startingSize(designInputSchema.parse(startingInput(card?.values, project.name)));
  const input = fields.input ?? start!.input;
  const result = start ? start.result : computeResult(input, ["input"]);
  const startedFrom = fields.input ? "First revision" : startingNote(card ? `Started from the ${card.jurisdiction} criteria card.` : "Started from the default design.", start!);
  const created = await createDesignWithRevision({
    projectId: project.id, organisationId: user.organisationId, name: fields.name, authorId: user.userId,
    input, result, engineVersion: ENGINE_VERSION, note: fields.note || startedFrom,
  });
  const sizing = start ? { pass: start.pass, changes: start.changes, advice: start.advice } : null;
  return { design: (await getDesign(created.designId))!, revisionId: created.revisionId, sizing };
}

/** The next revision of a design from `{ baseRevisionId, input, note }`; a stale base is a 409 naming the latest. */
export async function saveRevision(user: CurrentUser, designId: string, body: Body): Promise<DesignRevision> {
  const design = await designFor(user, designId);
  assertCanWrite(user);
  const fields = revisionCreateSchema.parse(await body());
  const saved = await insertRevision(user, design, fields);
  return (await getRevision(saved.id))! as DesignRevision;
}
