import { z } from "zod";
import { ConflictError } from "@/app/_lib/errors";
import { assertOwned, assertRole, type CurrentUser } from "@/app/_lib/auth";
import { recordAudit } from "@/db/queries/audit";
import { clearHoldRow, getHold } from "@/db/queries/holds";

export const clearHoldSchema = z.object({
  note: z.string().trim().min(3, { error: "Say how the hold was resolved (3 to 2000 characters)" }).max(2000, { error: "The note must be at most 2000 characters" }),
});

/** Only an engineer clears a hold, saying how it was resolved (e.g. deepened hole inspected). */
export async function clearHold(user: CurrentUser, holdId: string, note: string): Promise<void> {
  const hold = assertOwned(user, await getHold(holdId), "That hold");
  assertRole(user, "engineer");
  if (!(await clearHoldRow(hold.id, user.userId, note))) throw new ConflictError("This hold was already cleared.");
  await recordAudit({ organisationId: user.organisationId, actorUserId: user.userId, action: "hold-cleared", subject: hold.designId, detail: { holdId, note } });
}
