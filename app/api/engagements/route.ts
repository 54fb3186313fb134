import { apiRoute } from "@/app/_lib/api";
import { requireUser } from "@/app/_lib/auth";
import { myEngagements } from "@/app/_lib/services/engagements";

export const dynamic = "force-dynamic";

/** The signed-in engineer's engagements across every contractor. */
export const GET = apiRoute(async () => {
  const user = await requireUser();
  return Response.json({ rows: await myEngagements(user) });
});
