import { z } from "zod";
import { ConflictError } from "@/app/_lib/errors";
import { assertOwnedOrEngaged, assertRole, type CurrentUser } from "@/app/_lib/auth";
import { recordAudit } from "@/db/queries/audit";
import { clearHoldRow, getHold } from "@/db/queries/holds";

export const clearHoldSchema = z.object({
  note: z.string().trim().min(3, { error: "Say how the hold was resolved (3 to 2000 characters)" }).max(2000, { error: "The note must be at most 2000 characters" }),
});

/** A hold of the user's organisation, or of a project an outside engineer is engaged on (404 otherwise). */
export async function holdFor(user: CurrentUser, holdId: string) {
  return assertOwnedOrEngaged(user, await getHold(holdId), (h) => ({ designId: h.designId }), "That hold");
}

/** Only an engineer clears a hold, saying how it was resolved (e.g. deepened hole inspected). */
export async function clearHold(user: CurrentUser, holdId: string, note: string): Promise<void> {
  const hold = await holdFor(user, holdId);
  assertRole(user, "engineer");
  if (!(await clearHoldRow(hold.id, user.userId, note))) throw new ConflictError("This hold was already cleared.");
  await recordAudit({ organisationId: hold.organisationId, actorUserId: user.userId, action: "hold-cleared", subject: hold.designId, detail: { holdId, note } });
}
