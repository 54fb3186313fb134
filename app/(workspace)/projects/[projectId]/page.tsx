import type { Metadata } from "next";
import Link from "next/link";
import { hasRole, isOutsider, requireUser } from "@/app/_lib/auth";
import { cardFor, projectFor } from "@/app/_lib/designs";
import { forPage, refusable } from "@/app/_lib/page-access";
import { listQueryLenient } from "@/app/_lib/schemas/project";
import { CriteriaCardView } from "@/components/design/criteria-card-view";
import { Caution } from "@/components/ui/caution";
import { listDesigns } from "@/db/queries/designs";
import { listProjectFiles } from "@/db/queries/project-files";
import { projectEngagements } from "@/db/queries/engagements";
import { organisationName } from "@/db/queries/organisations";
import { EngagementsPanel } from "./_components/engagements-panel";
import { DesignsTable } from "./_components/designs-table";
import { readerUnits } from "@/app/_lib/unit-preference";
import { FilesTable } from "./_components/files-table";
import { NewDesignForm } from "./_components/new-design-form";
import { UploadForm } from "./_components/upload-form";
import { shortDate } from "@/components/ui/dates";

export const metadata: Metadata = { title: "Project" };
type Props = { params: Promise<{ projectId: string }>; searchParams: Promise<Record<string, string | string[] | undefined>> };

async function ProjectPage({ params, searchParams }: Props) {
  const { projectId } = await params;
  const search = await searchParams;
  const { user, project, card } = await forPage(async () => {
    const u = await requireUser();
    const p = await projectFor(u, projectId, { engaged: true });
    return { user: u, project: p, card: await cardFor(u, p.criteriaCardId, p) };
  }, `/projects/${projectId}`);
  const [designs, files] = await Promise.all([listDesigns(project.id, listQueryLenient(search, "d_")), listProjectFiles(project.id, listQueryLenient(search, "f_"))]);
  // An engaged outside engineer reads this project; only the contractor's own members write or engage.
  const outsider = isOutsider(user, project);
  const canWrite = !outsider && hasRole(user, "designer", "admin");
  const engagements = outsider ? [] : await projectEngagements(project.id);
  const contractor = outsider ? await organisationName(project.organisationId) : null;
  const fileRows = { ...files, rows: files.rows.map(({ objectKey: _o, thumbnailKey, organisationId: _g, projectId: _p, ...f }) => ({ ...f, hasThumbnail: Boolean(thumbnailKey) })) };

  return (
    <>
      <p className="text-sm"><Link href="/projects" className="text-accent-800 hover:underline">← Projects</Link>{contractor ? <span className="text-slate-600"> · you review this project for {contractor}</span> : null}</p>
      <div className="mt-2 flex flex-wrap items-start justify-between gap-3">
        <div>
          <h1 className="text-2xl font-semibold">{project.name}</h1>
          <p className="mt-1 text-sm text-slate-600">
            {project.address || "No address"}{project.address.toUpperCase().includes(`, ${project.state}`) ? "" : ` · ${project.state}`}
            {project.latitude !== null && project.longitude !== null ? ` · ${project.latitude.toFixed(4)}, ${project.longitude.toFixed(4)}` : ""}
          </p>
          {project.notes ? <p className="mt-2 max-w-2xl text-sm whitespace-pre-line text-slate-700">{project.notes}</p> : null}
        </div>
        {canWrite ? <Link href={`/projects/${project.id}/edit`} className="rounded-md border border-slate-300 bg-white px-3 py-1.5 text-sm hover:bg-slate-50">Edit project</Link> : null}
      </div>
      <p className="mt-3 max-w-2xl rounded-md border border-slate-200 bg-slate-50 px-3 py-2 text-sm text-slate-700">
        An approved revision carries the project facts as they were approved (name, address, state and criteria card). Edits here show on new revisions only.
      </p>

      <section aria-labelledby="card-heading" className="mt-6 rounded-lg border border-slate-200 bg-white p-4">
        <div className="flex flex-wrap items-baseline justify-between gap-2">
          <h2 id="card-heading" className="text-lg font-semibold">Design criteria{card ? `: ${card.jurisdiction}, ${card.state}` : ""}</h2>
          {outsider ? null : <Link href="/criteria" className="text-sm text-accent-800 hover:underline">All criteria cards</Link>}
        </div>
        {card ? <div className="mt-3"><CriteriaCardView card={card} units={await readerUnits()} /></div> : (
          <p className="mt-2 text-sm text-amber-900">No criteria card applied. {canWrite ? <Link href={`/projects/${project.id}/edit`} className="underline">Choose one</Link> : null} so designs start from the jurisdiction&apos;s wind, snow, frost and soil values.</p>
        )}
      </section>

      <section aria-labelledby="designs-heading" className="mt-8 space-y-3">
        <h2 id="designs-heading" className="text-lg font-semibold">Designs</h2>
        <DesignsTable page={designs} projectId={project.id} timeZone={user.timeZone} units={await readerUnits()} />
        {canWrite ? <NewDesignForm projectId={project.id} hasCard={Boolean(card)} /> : null}
      </section>

      <section aria-labelledby="files-heading" className="mt-8 space-y-3">
        <h2 id="files-heading" className="text-lg font-semibold">Photos and documents</h2>
        <FilesTable page={fileRows} projectId={project.id} timeZone={user.timeZone} />
        {canWrite ? <UploadForm projectId={project.id} /> : null}
      </section>

      {outsider ? null : (
        <EngagementsPanel projectId={project.id} canManage={canWrite}
          items={engagements.map((e) => ({ id: e.id, email: e.email, engineerName: e.engineerName, status: e.status,
            when: e.status === "revoked" && e.revokedAt ? `revoked ${shortDate(e.revokedAt, user.timeZone)}` : e.respondedAt ? `${e.status} ${shortDate(e.respondedAt, user.timeZone)}` : `invited ${shortDate(e.invitedAt, user.timeZone)} by ${e.invitedByName}` }))} />
      )}

      <Caution compact className="mt-8" />
    </>
  );
}

// Its 404/403 with the words in the server HTML (app/_lib/page-access.tsx).
export default refusable(ProjectPage);
