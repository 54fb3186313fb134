import { apiRoute, readJson } from "@/app/_lib/api";
import { assertRole, requireUser } from "@/app/_lib/auth";
import { reviewSchema } from "@/app/_lib/review/schemas";
import { decideRevision, ownedRevision } from "@/app/_lib/review/workflow";

export const dynamic = "force-dynamic";

/**
 * An engineer decides a revision in review: `{ decision: "approve" | "request-changes", comments }`,
 * comments being a text or a list of `{ fieldPath?, body }`. The designer is e-mailed.
 */
export const POST = apiRoute<{ params: Promise<{ revisionId: string }> }>(async (request, { params }) => {
  const user = await requireUser();
  const { revisionId: id } = await params;
  // Who, whose, which role: before reading the body, so a wrong role is a 403 whatever was sent.
  await ownedRevision(user, id, { engaged: true });
  assertRole(user, "engineer");
  const body = reviewSchema.parse(await readJson(request));
  const { status } = await decideRevision(user, id, body);
  return Response.json({ revisionId: id, status });
});
