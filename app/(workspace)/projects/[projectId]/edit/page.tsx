import type { Metadata } from "next";
import Link from "next/link";
import { requireUser } from "@/app/_lib/auth";
import { assertCanWrite, projectFor } from "@/app/_lib/designs";
import { forPage, refusable } from "@/app/_lib/page-access";
import { US_STATES } from "@/app/_lib/schemas/project";
import { listCriteriaCards } from "@/db/queries/criteria-cards";
import { updateProjectAction } from "../../actions";
import { ProjectForm } from "../../_components/project-form";

export const metadata: Metadata = { title: "Edit project" };

async function EditProjectPage({ params }: { params: Promise<{ projectId: string }> }) {
  const { projectId } = await params;
  const { user, project } = await forPage(async () => {
    const u = await requireUser();
    const p = await projectFor(u, projectId);
    assertCanWrite(u);
    return { user: u, project: p };
  }, `/projects/${projectId}/edit`);
  const cards = await listCriteriaCards(user.organisationId);
  return (
    <>
      <p className="text-sm"><Link href={`/projects/${project.id}`} className="text-accent-800 hover:underline">← {project.name}</Link></p>
      <h1 className="mt-2 mb-4 text-2xl font-semibold">Edit project</h1>
      <ProjectForm action={updateProjectAction} project={project} cards={cards} states={US_STATES} submitLabel="Save project" />
    </>
  );
}

// Its 404/403 with the words in the server HTML (app/_lib/page-access.tsx).
export default refusable(EditProjectPage);
