import type { Metadata } from "next";
import { requireUser } from "@/app/_lib/auth";
import { forPage } from "@/app/_lib/page-access";
import { Caution } from "@/components/ui/caution";

export const metadata: Metadata = { title: "Projects" };

export default async function ProjectsPage() {
  const user = await forPage(() => requireUser(), "/projects");
  return (
    <>
      <h1 className="text-2xl font-semibold">Projects</h1>
      <p className="mt-1 text-sm text-slate-600">Signed in to {user.organisationName}.</p>
      <Caution className="mt-4" />
    </>
  );
}
