import type { Metadata } from "next";
import Link from "next/link";
import { requireUser } from "@/app/_lib/auth";
import { assertCanWrite } from "@/app/_lib/designs";
import { forPage, refusable } from "@/app/_lib/page-access";
import { US_STATES } from "@/app/_lib/schemas/project";
import { listCriteriaCards } from "@/db/queries/criteria-cards";
import { createProjectAction } from "../actions";
import { ProjectForm } from "../_components/project-form";

export const metadata: Metadata = { title: "New project" };

async function NewProjectPage() {
  const user = await forPage(async () => {
    const u = await requireUser();
    assertCanWrite(u);
    return u;
  }, "/projects/new");
  const cards = await listCriteriaCards(user.organisationId);
  return (
    <>
      <p className="text-sm"><Link href="/projects" className="text-accent-800 hover:underline">← Projects</Link></p>
      <h1 className="mt-2 text-2xl font-semibold">New project</h1>
      <p className="mt-1 mb-4 text-sm text-slate-600">
        A customer site. Pick the jurisdiction&apos;s criteria card so designs start from its wind, snow, frost and soil values
        {cards.length === 0 ? <> — <Link href="/criteria" className="text-accent-800 underline">add a card first</Link></> : null}.
      </p>
      <ProjectForm action={createProjectAction} cards={cards} states={US_STATES} submitLabel="Create project" />
    </>
  );
}

// Its 404/403 with the words in the server HTML (app/_lib/page-access.tsx).
export default refusable(NewProjectPage);
