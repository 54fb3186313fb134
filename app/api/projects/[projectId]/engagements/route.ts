import { apiRoute, readJson } from "@/app/_lib/api";
import { requireUser } from "@/app/_lib/auth";
import { engageEngineer, listEngagements } from "@/app/_lib/services/engagements";

export const dynamic = "force-dynamic";
type Context = { params: Promise<{ projectId: string }> };

/** The project's engagements of outside engineers (members of the project's organisation). */
export const GET = apiRoute<Context>(async (_request, { params }) => {
  const user = await requireUser();
  return Response.json({ rows: await listEngagements(user, (await params).projectId) });
});

/** `{ email, message? }`: engage an outside engineer on this project; they are e-mailed a link (designers, admins). */
export const POST = apiRoute<Context>(async (request, { params }) => {
  const user = await requireUser();
  const engagement = await engageEngineer(user, (await params).projectId, () => readJson(request));
  return Response.json(engagement, { status: 201 });
});
