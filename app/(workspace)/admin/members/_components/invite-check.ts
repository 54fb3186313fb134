import { z } from "zod";
import { inviteInput, inviteSchema } from "@/app/_lib/schemas/members";
import type { FormCheck } from "@/components/ui/use-deferred-validation";

/** The invitation form's browser check: the server action's own schema (loaded on first focus). */
export const checkInvite: FormCheck = (form) => {
  const parsed = inviteSchema.safeParse(inviteInput(form));
  return parsed.success ? undefined : (z.flattenError(parsed.error).fieldErrors as Record<string, string[] | undefined>);
};
