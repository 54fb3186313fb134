import "server-only";
import { z } from "zod";
import { setChecklistTick } from "@/db/queries/field-checklist";
import { isFieldChecklistKey } from "@/engine/field-checklist";
import { assertRole, type CurrentUser } from "../auth";
import { ConflictError } from "../errors";
import { ownedRevision } from "../review/workflow";

export const checklistTickSchema = z.object({
  itemKey: z.string().refine(isFieldChecklistKey, "Choose an item of the field checklist"),
  ticked: z.boolean({ error: "Say whether the item is done (true or false)" }),
});

/** The crew (installers, engineers) ticks or unticks one item of an approved revision's field checklist. */
export async function tickChecklistItem(user: CurrentUser, revisionId: string, input: unknown): Promise<void> {
  const revision = await ownedRevision(user, revisionId);
  assertRole(user, "installer", "engineer");
  const { itemKey, ticked } = checklistTickSchema.parse(input);
  if (revision.status !== "approved") throw new ConflictError(`Revision ${revision.number} is not approved; only an approved revision's field checklist can be ticked.`);
  await setChecklistTick({ revisionId, organisationId: revision.organisationId, itemKey, ticked, userId: user.userId });
}
