import { apiRoute } from "@/app/_lib/api";
import { requireUser } from "@/app/_lib/auth";
import { revokeInvitation } from "@/app/_lib/services/members";

export const dynamic = "force-dynamic";
type Context = { params: Promise<{ invitationId: string }> };

/** Makes a pending invitation stop working at once (admins of its organisation). */
export const DELETE = apiRoute<Context>(async (_request, { params }) => {
  const user = await requireUser();
  const revoked = await revokeInvitation(user, (await params).invitationId);
  return Response.json({ invitation: { email: revoked.email, revoked: true } });
});
