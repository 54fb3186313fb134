import { apiRoute, readJson } from "@/app/_lib/api";
import { requireUser } from "@/app/_lib/auth";
import { inviteMember } from "@/app/_lib/services/members";

export const dynamic = "force-dynamic";

/** `{ email, roles }`: invite a person to the caller's organisation; they are e-mailed a 7-day single-use link (admins). */
export const POST = apiRoute(async (request) => {
  const user = await requireUser();
  const invited = await inviteMember(user, () => readJson(request));
  return Response.json({ invitation: { id: invited.invitationId, email: invited.email } }, { status: 201 });
});
