import { apiRoute } from "@/app/_lib/api";
import { requireUser } from "@/app/_lib/auth";
import { projectFor } from "@/app/_lib/designs";
import { listQueryFrom } from "@/app/_lib/schemas/project";
import { uploadProjectFile } from "@/app/_lib/services/project-files";
import { listProjectFiles } from "@/db/queries/project-files";

export const dynamic = "force-dynamic";
type Context = { params: Promise<{ projectId: string }> };

/** The project's uploads (`?q=&sort=originalName|kind|sizeBytes|createdAt&dir=&page=&pageSize=`). */
export const GET = apiRoute<Context>(async (request, { params }) => {
  const user = await requireUser();
  const project = await projectFor(user, (await params).projectId, { engaged: true });
  const page = await listProjectFiles(project.id, listQueryFrom(new URL(request.url).searchParams));
  return Response.json({ ...page, rows: page.rows.map(({ objectKey: _o, thumbnailKey, ...r }) => ({ ...r, hasThumbnail: Boolean(thumbnailKey) })) });
});

/**
 * Upload one file as multipart field `file` (optional `description`). Refused with 422 before
 * anything is stored when it is too large or its content is not a JPEG, PNG, WebP or PDF.
 */
export const POST = apiRoute<Context>(async (request, { params }) => {
  const file = await uploadProjectFile(await requireUser(), (await params).projectId, {
    declaredBytes: Number(request.headers.get("content-length") ?? 0),
    form: () => request.formData(),
  });
  return Response.json({ file }, { status: 201 });
}, { body: "multipart" });
