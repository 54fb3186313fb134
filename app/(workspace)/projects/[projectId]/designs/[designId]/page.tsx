import type { Metadata } from "next";
import Link from "next/link";
import { AccessError, hasRole, isOutsider, requireUser } from "@/app/_lib/auth";
import { cardFor, designFor, isUuid, projectFor, revisionFor, type DesignRevision } from "@/app/_lib/designs";
import { forPage, refusable } from "@/app/_lib/page-access";
import { StatusBadge } from "@/components/review/status-badge";
import { DesignReviewBar, designReviewReads } from "@/components/review/design-review-bar";
import { clearHoldAction } from "@/app/(workspace)/reviews/[revisionId]/actions";
import { latestRevision, listRevisions } from "@/db/queries/revisions";
import { listQueryLenient } from "@/app/_lib/schemas/project";
import { DesignEditor } from "./_components/design-editor";
import { chosenUnits, readerUnits } from "@/app/_lib/unit-preference";
import { RevisionsSection } from "./_components/revisions-section";
import { revisionNoteIn } from "@/components/format/revision-note";
import { shortDateTime } from "@/components/ui/dates";
import { editorPinnedComments, readEditorPinnedComments } from "@/app/_lib/services/review-comments";

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
  const { user, project, design, card, latest, viewing, from, pinnedRows, revisions, reviewReads } = await forPage(async () => {
    const u = await requireUser();
    // Every read starts at once (three waits on the database at most, not eight in a row); each is
    // checked, in the order the checks always ran (project, design, revisions: the first refusal
    // answers), before anything read is used. The design's own reads go by its id from the address
    // only when it is an id at all; what they return is dropped unless the design check passes.
    const designKey = isUuid(designId) ? designId : undefined;
    // Reading is open to an engineer engaged on the project; writing stays with members (canWrite below).
    const projectAndCard = projectFor(u, projectId, { engaged: true }).then(async (p) => ({ p, card: await cardFor(u, p.criteriaCardId, p) }));
    const pick = (id: string | undefined) => (id ? revisionFor(u, id, { engaged: true }) : Promise.resolve(null));
    const latestRead = designKey ? (latestRevision(designKey) as Promise<DesignRevision | undefined>) : Promise.resolve(undefined);
    const viewingRead = pick(one("revision"));
    // Once the revision shown is known: the pinned comments beside the fields (the latest decision
    // at or before it) and the review bar's holds and newer approval.
    const shownRead = Promise.all([latestRead, viewingRead.catch(() => null)]).then(([l, v]) => (v && v.designId === designKey ? v : l));
    const pinnedRead = shownRead.then((shown) => (designKey && shown ? readEditorPinnedComments(designKey, shown.number) : []));
    const reviewRead = shownRead.then((shown) => (designKey && shown ? designReviewReads(designKey, shown) : undefined));
    // Below the editor: a page of the design's revisions.
    const revisionsRead = designKey ? listRevisions(designKey, listQueryLenient(search, "r_")) : Promise.resolve(undefined);
    const [pc, d, l, v, f, pinned, list, review] = await Promise.allSettled([projectAndCard, designFor(u, designId, { engaged: true }), latestRead, viewingRead, pick(one("from")), pinnedRead, revisionsRead, reviewRead]);
    const value = <T,>(r: PromiseSettledResult<T>): T => {
      if (r.status === "rejected") throw r.reason;
      return r.value;
    };
    const { p, card } = value(pc);
    const design = value(d);
    if (design.projectId !== p.id) throw new AccessError(404, "That design was not found.");
    const latest = value(l);
    if (!latest) throw new Error(`design ${design.id} has no revision`);
    const inDesign = (r: DesignRevision | null) => {
      if (r && r.designId !== design.id) throw new AccessError(404, "That revision was not found.");
      return r;
    };
    const viewing = inDesign(value(v));
    const from = inDesign(value(f));
    return { user: u, project: p, design, card, latest, viewing, from, pinnedRows: value(pinned), revisions: value(list)!, reviewReads: value(review)! };
  }, path);

  const canWrite = !isOutsider(user, project) && hasRole(user, "designer", "admin");
  const shown = viewing ?? latest;
  const isOld = shown.id !== latest.id;
  const start = !isOld && from && canWrite ? from : shown;
  const [units, chosen] = await Promise.all([readerUnits(), chosenUnits()]);
  const pinnedComments = editorPinnedComments(user, pinnedRows, shown.input, units);

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
      <DesignReviewBar reads={reviewReads} revisionId={shown.id} status={shown.status} clearAction={hasRole(user, "engineer") ? clearHoldAction : undefined} timeZone={user.timeZone} units={units} />
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
          units={chosen}
        />
      </div>

      <section aria-labelledby="revisions-heading" className="mt-10 space-y-3">
        <div className="flex flex-wrap items-baseline justify-between gap-2">
          <h2 id="revisions-heading" className="text-lg font-semibold">Revisions</h2>
          {latest.number > 1 ? <Link href={`${path}/diff`} className="text-sm text-accent-800 hover:underline">Compare two revisions</Link> : null}
        </div>
        <RevisionsSection revisions={revisions} path={path} search={search} latestId={latest.id} viewingId={shown.id} timeZone={user.timeZone} units={units} />
      </section>
    </>
  );
}

// Its 404/403 with the words in the server HTML (app/_lib/page-access.tsx).
export default refusable(DesignPage);
