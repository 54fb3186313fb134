import { apiRoute } from "@/app/_lib/api";
import { requireUser } from "@/app/_lib/auth";
import { memberView, membersOverview } from "@/app/_lib/services/members";

export const dynamic = "force-dynamic";

/** The organisation's members (active and deactivated) and its pending invitations (admins). */
export const GET = apiRoute(async () => {
  const user = await requireUser();
  const { members, invitations } = await membersOverview(user);
  return Response.json({
    members: members.map(memberView),
    invitations: invitations.map((i) => ({ id: i.id, email: i.email, roles: i.roles, invitedBy: i.invitedByName, expiresAt: i.expiresAt })),
  });
});
