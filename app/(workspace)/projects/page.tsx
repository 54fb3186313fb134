import type { Metadata } from "next";
import Link from "next/link";
import { hasRole, requireUser } from "@/app/_lib/auth";
import { forPage, refusable } from "@/app/_lib/page-access";
import { listQueryLenient } from "@/app/_lib/schemas/project";
import { Caution } from "@/components/ui/caution";
import { listProjects } from "@/db/queries/projects";
import { ProjectsTable } from "./_components/projects-table";

export const metadata: Metadata = { title: "Projects" };

async function ProjectsPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const user = await forPage(() => requireUser(), "/projects");
  const page = await listProjects(user.organisationId, listQueryLenient(await searchParams), user.userId);
  const showContractor = page.rows.some((r) => r.organisationName !== user.organisationName);
  return (
    <>
      <div className="flex flex-wrap items-end justify-between gap-3">
        <div>
          <h1 className="text-2xl font-semibold">Projects</h1>
          <p className="mt-1 text-sm text-slate-600">Customer sites of {user.organisationName}: each holds its criteria card, designs and uploads.</p>
        </div>
        {hasRole(user, "designer", "admin") ? (
          <Link href="/projects/new" className="rounded-md bg-accent-700 px-4 py-2 text-sm font-medium text-white hover:bg-accent-800">New project</Link>
        ) : null}
      </div>
      <div className="mt-4">
        <ProjectsTable page={page} timeZone={user.timeZone} showContractor={showContractor} />
      </div>
      <Caution compact className="mt-6" />
    </>
  );
}

// Its 404/403 with the words in the server HTML (app/_lib/page-access.tsx).
export default refusable(ProjectsPage);
