import { apiRoute } from "@/app/_lib/api";
import { AccessError, requireUser } from "@/app/_lib/auth";
import { isUuid, projectFor } from "@/app/_lib/designs";
import { getObject } from "@/app/_lib/storage";
import { fileResponse } from "@/app/_lib/uploads";
import { getProjectFile } from "@/db/queries/project-files";

export const dynamic = "force-dynamic";
type Context = { params: Promise<{ projectId: string; fileId: string }> };

/**
 * Download an upload (or `?variant=thumbnail` for a photo's thumbnail) after the access check.
 * Photos open in the browser; PDFs download.
 */
export const GET = apiRoute<Context>(async (request, { params }) => {
  const user = await requireUser();
  const { projectId, fileId } = await params;
  const project = await projectFor(user, projectId, { engaged: true });
  const found = isUuid(fileId) ? await getProjectFile(fileId) : undefined;
  // The file must be this project's: the project's access check then covers it (members and engaged engineers alike).
  if (!found || found.projectId !== project.id || found.organisationId !== project.organisationId) throw new AccessError(404, "That file was not found.");
  const file = found;
  const wantsThumbnail = new URL(request.url).searchParams.get("variant") === "thumbnail";
  if (wantsThumbnail && !file.thumbnailKey) return Response.json({ errors: [{ path: "variant", message: "Only photos have thumbnails" }] }, { status: 404 });
  const object = await getObject(wantsThumbnail ? file.thumbnailKey! : file.objectKey);
  // Photos open in the browser; PDFs download (fileResponse re-sniffs and sets the safety headers).
  return fileResponse(object.body, { fileName: wantsThumbnail ? `thumbnail-${file.originalName}.webp` : file.originalName, inlinePhotos: true });
});
