import { DesignInputError, EngineInputError, ENGINE_VERSION, sizeParsedDesign, type DesignInput, type DesignResult } from "@/engine";
import { getCriteriaCard, type CriteriaCard } from "@/db/queries/criteria-cards";
import { getDesign, type Design } from "@/db/queries/designs";
import { getProject, type Project } from "@/db/queries/projects";
import { createRevision, getRevision, StaleRevisionError, type Revision } from "@/db/queries/revisions";
import { isUuid } from "@/db/ids";
import { assertOwned, assertOwnedOrEngaged, assertRole, type CurrentUser } from "./auth";
import { ConflictError, ValidationError } from "./errors";

/**
 * Loading a project, design or revision for the signed-in member (404 when it is another
 * organisation's), and saving a revision: validate, size with the engine, insert in one transaction.
 */
export type DesignRevision = Revision<DesignInput, DesignResult>;

/**
 * `{ engaged: true }` opens a read (or the engineer's review work) to an outside engineer engaged on
 * the project (app/_lib/auth.ts assertOwnedOrEngaged); without it only members pass.
 */
export interface Reach {
  engaged?: boolean;
}

export async function projectFor(user: CurrentUser, id: string, reach: Reach = {}): Promise<Project> {
  const project = isUuid(id) ? await getProject(id) : undefined;
  if (reach.engaged) return assertOwnedOrEngaged(user, project, (p) => ({ projectId: p.id }), "That project");
  return assertOwned(user, project, "That project");
}

export async function designFor(user: CurrentUser, id: string, reach: Reach = {}): Promise<Design> {
  const design = isUuid(id) ? await getDesign(id) : undefined;
  if (reach.engaged) return assertOwnedOrEngaged(user, design, (d) => ({ projectId: d.projectId }), "That design");
  return assertOwned(user, design, "That design");
}

export async function revisionFor(user: CurrentUser, id: string, reach: Reach = {}): Promise<DesignRevision> {
  const revision = isUuid(id) ? await getRevision<DesignInput, DesignResult>(id) : undefined;
  if (reach.engaged) return assertOwnedOrEngaged(user, revision, (r) => ({ revisionId: r.id }), "That revision");
  return assertOwned(user, revision, "That revision");
}

/**
 * A criteria card. An engaged engineer sees only the card the project they reached uses (pass that
 * project as `via`); every other card of the contractor stays 404 to them.
 */
export async function cardFor(user: CurrentUser, id: string | null, via?: Project): Promise<CriteriaCard | null> {
  if (!id) return null;
  const card = isUuid(id) ? await getCriteriaCard(id) : undefined;
  if (via && card && via.criteriaCardId === card.id && via.organisationId === card.organisationId) return card;
  return assertOwned(user, card, "That criteria card");
}

/** Designers and admins write; engineers and installers of the organisation read. */
export function assertCanWrite(user: CurrentUser): void {
  assertRole(user, "designer", "admin");
}

// The one strict id check lives in db/ids.ts; re-exported for the callers that load records here.
export { isUuid };

/** Runs the engine; a range only the engine knows about becomes a 422 naming the field (under `prefix`). */
export function computeResult(input: DesignInput, prefix: string[] = []): DesignResult {
  try {
    return sizeParsedDesign(input);
  } catch (error) {
    if (error instanceof DesignInputError || error instanceof EngineInputError) {
      throw new ValidationError(error.issues.map((i) => ({ path: [...prefix, i.path].join("."), message: i.message })));
    }
    throw error;
  }
}

/** Saves the next revision of a design from `baseRevisionId`; a stale base is a 409 naming the latest. */
export async function saveRevision(user: CurrentUser, design: Design, body: { baseRevisionId: string; input: DesignInput; note: string }) {
  const result = computeResult(body.input, ["input"]);
  try {
    return await createRevision({
      designId: design.id, organisationId: design.organisationId, baseRevisionId: body.baseRevisionId,
      input: body.input, result, engineVersion: ENGINE_VERSION, note: body.note, authorId: user.userId,
    });
  } catch (error) {
    if (error instanceof StaleRevisionError) {
      throw new ConflictError(error.message, { latestRevisionId: error.latest?.id ?? null, latestNumber: error.latest?.number ?? null });
    }
    throw error;
  }
}
