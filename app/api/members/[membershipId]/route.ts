import { apiRoute, readJson } from "@/app/_lib/api";
import { requireUser } from "@/app/_lib/auth";
import { memberView, updateMember } from "@/app/_lib/services/members";

export const dynamic = "force-dynamic";
type Context = { params: Promise<{ membershipId: string }> };

/**
 * `{ roles }` sets a member's roles, `{ active: false | true }` deactivates or reactivates them
 * (admins of their organisation; never leaves it without an active admin: 409).
 */
export const PATCH = apiRoute<Context>(async (request, { params }) => {
  const user = await requireUser();
  return Response.json({ member: memberView(await updateMember(user, (await params).membershipId, () => readJson(request))) });
});
