import { apiRoute, readJson } from "@/app/_lib/api";
import { assertRole, requireUser } from "@/app/_lib/auth";
import { submitSchema } from "@/app/_lib/review/schemas";
import { ownedRevision, submitRevision } from "@/app/_lib/review/workflow";

export const dynamic = "force-dynamic";

/** A designer submits a revision for review: `{ engineerId }`. The engineer is e-mailed a link. */
export const POST = apiRoute<{ params: Promise<{ revisionId: string }> }>(async (request, { params }) => {
  const user = await requireUser();
  const { revisionId: id } = await params;
  // Who, whose, which role: before reading the body, so a wrong role is a 403 whatever was sent.
  await ownedRevision(user, id);
  assertRole(user, "designer");
  const body = submitSchema.parse(await readJson(request));
  const { reviewId } = await submitRevision(user, id, body.engineerId);
  return Response.json({ revisionId: id, status: "in_review", reviewId });
});
