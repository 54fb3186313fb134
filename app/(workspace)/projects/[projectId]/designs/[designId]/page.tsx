import type { Metadata } from "next";
import Link from "next/link";
import { AccessError, hasRole, isOutsider, requireUser } from "@/app/_lib/auth";
import { cardFor, designFor, projectFor, revisionFor, type DesignRevision } from "@/app/_lib/designs";
import { forPage, refusable } from "@/app/_lib/page-access";
import { listQueryLenient } from "@/app/_lib/schemas/project";
import { StatusBadge } from "@/components/review/status-badge";
import { DesignReviewBar } from "@/components/review/design-review-bar";
import { clearHoldAction } from "@/app/(workspace)/reviews/[revisionId]/actions";
import { latestRevision, listRevisions } from "@/db/queries/revisions";
import { DesignEditor } from "./_components/design-editor";
import { chosenUnits, readerUnits } from "@/app/_lib/unit-preference";
import { RevisionsTableLazy } from "./_components/revisions-table-lazy";
import { REVISIONS_TABLE, revisionColumns } from "./_components/revision-columns";
import { ServerDataTable } from "@/components/design/server-data-table";
import { revisionNoteIn } from "@/components/format/revision-note";
import { shortDateTime } from "@/components/ui/dates";
import { editorPinnedComments } from "@/app/_lib/services/review-comments";

export const metadata: Metadata = { title: "Design" };
type Props = { params: Promise<{ projectId: string; designId: string }>; searchParams: Promise<Record<string, string | string[] | undefined>> };

/**
 * The design editor on its latest revision. `?revision=<id>` opens an older revision read-only;
 * `?from=<id>` starts editing from an older revision's values on top of the latest.
 */
async function DesignPage({ params, searchParams }: Props) {
  const { projectId, designId } = await params;
  const search = await searchParams;
  const one = (k: string) => (Array.isArray(search[k]) ? search[k][0] : search[k]);
  const path = `/projects/${projectId}/designs/${designId}`;
  const { user, project, design, card, latest, viewing, from } = await forPage(async () => {
    const u = await requireUser();
    // Reading is open to an engineer engaged on the project; writing stays with members (canWrite below).
    const p = await projectFor(u, projectId, { engaged: true });
    const d = await designFor(u, designId, { engaged: true });
    if (d.projectId !== p.id) throw new AccessError(404, "That design was not found.");
    const l = (await latestRevision(d.id)) as DesignRevision | undefined;
    if (!l) throw new Error(`design ${d.id} has no revision`);
    const pick = async (id: string | undefined) => {
      if (!id) return null;
      const r = await revisionFor(u, id, { engaged: true });
      if (r.designId !== d.id) throw new AccessError(404, "That revision was not found.");
      return r;
    };
    return { user: u, project: p, design: d, card: await cardFor(u, p.criteriaCardId, p), latest: l, viewing: await pick(one("revision")), from: await pick(one("from")) };
  }, path);

  const canWrite = !isOutsider(user, project) && hasRole(user, "designer", "admin");
  const shown = viewing ?? latest;
  const isOld = shown.id !== latest.id;
  const start = !isOld && from && canWrite ? from : shown;
  const [revisions, pinnedComments, units] = await Promise.all([
    listRevisions(design.id, listQueryLenient(search, "r_")),
    // Beside the fields: the comments of the latest decision, resolved where the revision shown changed the field.
    editorPinnedComments(user, design.id, shown),
    readerUnits(),
  ]);

  const revisionsPage = { ...revisions, rows: revisions.rows.map((r) => ({ ...r, note: revisionNoteIn(r.note, units) })) };
  const revisionProps = { basePath: path, latestId: latest.id, viewingId: shown.id, timeZone: user.timeZone, units };

  return (
    <>
      <nav aria-label="Breadcrumb" className="text-sm">
        <Link href="/projects" className="text-accent-800 hover:underline">Projects</Link> <span className="text-slate-600">/</span>{" "}
        <Link href={`/projects/${project.id}`} className="text-accent-800 hover:underline">{project.name}</Link>
      </nav>
      <div className="mt-2 flex flex-wrap items-center gap-3">
        <h1 className="text-2xl font-semibold">{design.name}</h1>
        <span className="text-sm text-slate-600">Revision {shown.number} of {latest.number}</span>
        <StatusBadge status={shown.status} />
      </div>
      <p className="mt-1 text-sm text-slate-600">
        Saved {shortDateTime(shown.createdAt, user.timeZone)} by {shown.authorName ?? "someone"}{shown.note ? ` — “${revisionNoteIn(shown.note, units).replace(/\.$/, "")}”` : ""}.
        <span className="ml-1 font-mono text-xs text-slate-600" title="Content hash (sha256 of input, result and engine version)">#{shown.contentHash.slice(0, 10)}</span>
      </p>
      <DesignReviewBar designId={design.id} revisionId={shown.id} number={shown.number} status={shown.status} clearAction={hasRole(user, "engineer") ? clearHoldAction : undefined} timeZone={user.timeZone} units={units} />
      {isOld ? (
        <div role="status" className="mt-3 flex flex-wrap items-center gap-3 rounded-md border border-sky-300 bg-sky-50 px-3 py-2 text-sm text-sky-950">
          <span>You are reading revision {shown.number}, an older revision. It cannot change.</span>
          <Link href={path} className="font-medium underline">Open the latest</Link>
          <Link href={`${path}/diff?from=${shown.id}&to=${latest.id}`} className="font-medium underline">Compare with the latest</Link>
          {canWrite ? <Link href={`${path}?from=${shown.id}`} className="font-medium underline">Edit from these values</Link> : null}
        </div>
      ) : start.id !== latest.id ? (
        <p role="status" className="mt-3 rounded-md border border-sky-300 bg-sky-50 px-3 py-2 text-sm text-sky-950">Editing from revision {start.number}&apos;s values; saving makes revision {latest.number + 1}.</p>
      ) : null}

      <div className="mt-4">
        <DesignEditor
          // Stays mounted across the refresh after a save (a new latest), so typing in progress is kept.
          key={isOld ? `old-${shown.id}` : start.id !== latest.id ? `from-${start.id}` : "latest"}
          designId={design.id}
          initialInput={start.input}
          initialResult={start.result}
          baseRevisionId={latest.id}
          baseNumber={latest.number}
          readOnly={!canWrite || isOld}
          card={card ? { label: `${card.jurisdiction}, ${card.state}`, values: card.values } : null}
          pinnedComments={pinnedComments}
          units={await chosenUnits()}
        />
      </div>

      <section aria-labelledby="revisions-heading" className="mt-10 space-y-3">
        <div className="flex flex-wrap items-baseline justify-between gap-2">
          <h2 id="revisions-heading" className="text-lg font-semibold">Revisions</h2>
          {latest.number > 1 ? <Link href={`${path}/diff`} className="text-sm text-accent-800 hover:underline">Compare two revisions</Link> : null}
        </div>
        {/* Below the editor: drawn on the server, the browser's table loads when the reader reaches for it. */}
        <RevisionsTableLazy page={revisionsPage} {...revisionProps}>
          <ServerDataTable page={revisionsPage} columns={revisionColumns(revisionProps)} {...REVISIONS_TABLE} pathname={path} search={search} />
        </RevisionsTableLazy>
      </section>
    </>
  );
}

// Its 404/403 with the words in the server HTML (app/_lib/page-access.tsx).
export default refusable(DesignPage);
