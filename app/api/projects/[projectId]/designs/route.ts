import { apiRoute, readJson } from "@/app/_lib/api";
import { requireUser } from "@/app/_lib/auth";
import { startingInput } from "@/app/_lib/design-defaults";
import { assertCanWrite, cardFor, computeResult, projectFor } from "@/app/_lib/designs";
import { designCreateSchema, listQueryFrom } from "@/app/_lib/schemas/project";
import { createDesignWithRevision, getDesign, listDesigns } from "@/db/queries/designs";
import { designInputSchema, ENGINE_VERSION } from "@/engine";

export const dynamic = "force-dynamic";
type Context = { params: Promise<{ projectId: string }> };

/** The project's designs with their latest revision's number, status and footing. */
export const GET = apiRoute<Context>(async (request, { params }) => {
  const user = await requireUser();
  const project = await projectFor(user, (await params).projectId, { engaged: true });
  return Response.json(await listDesigns(project.id, listQueryFrom(new URL(request.url).searchParams)));
});

/**
 * A new design with its revision 1: from `input` when given, else from the defaults with the
 * project's criteria card applied.
 */
export const POST = apiRoute<Context>(async (request, { params }) => {
  const user = await requireUser();
  const project = await projectFor(user, (await params).projectId);
  assertCanWrite(user);
  const body = designCreateSchema.parse(await readJson(request));
  const card = await cardFor(user, project.criteriaCardId);
  const input = body.input ?? designInputSchema.parse(startingInput(card?.values, project.name));
  const result = computeResult(input, body.input ? ["input"] : []);
  const created = await createDesignWithRevision({
    projectId: project.id, organisationId: user.organisationId, name: body.name, authorId: user.userId,
    input, result, engineVersion: ENGINE_VERSION, note: body.note || "First revision",
  });
  return Response.json({ design: await getDesign(created.designId), revisionId: created.revisionId }, { status: 201 });
});
