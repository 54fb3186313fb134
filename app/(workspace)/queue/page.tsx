import type { Metadata } from "next";
import { requireUser } from "@/app/_lib/auth";
import { forPage, refusable } from "@/app/_lib/page-access";
import { listQueryLenient } from "@/app/_lib/schemas/project";
import { AnswerForm } from "@/components/engagements/answer-form";
import { answerEngagementAction } from "@/app/(workspace)/queue/actions";
import { Caution } from "@/components/ui/caution";
import { invitationsOfPerson } from "@/db/queries/engagements";
import { engineerQueue, queueContractors, type QueueState } from "@/db/queries/engineer-queue";
import { QueueFilters } from "./_components/queue-filters";
import { QueueTable } from "./_components/queue-table";
import { readerUnits } from "@/app/_lib/unit-preference";

export const metadata: Metadata = { title: "Review queue" };

const STATES: QueueState[] = ["waiting", "on_hold", "decided"];

/**
 * A reviewing engineer's one queue across every contractor: what waits for their decision, what is
 * on hold after their approval, and what they decided, filtered by contractor and state and paged
 * on the server. Invitations not yet answered are listed above it.
 */
async function QueuePage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const user = await forPage(() => requireUser(), "/queue");
  const search = await searchParams;
  const one = (k: string) => (Array.isArray(search[k]) ? search[k][0] : search[k]) ?? "";
  const state = STATES.find((s) => s === one("state"));
  const [page, contractors, invited] = await Promise.all([
    engineerQueue(user, listQueryLenient(search), { contractor: one("contractor") || undefined, state }),
    queueContractors(user),
    // Only the unanswered ones: the page lists nothing else of them.
    invitationsOfPerson(user.userId, user.email),
  ]);
  return (
    <>
      <h1 className="text-2xl font-semibold">Review queue</h1>
      <p className="mt-1 text-sm text-slate-600">Every revision submitted to you, for every contractor you review for.</p>
      {one("accepted") ? <p role="status" className="mt-3 rounded-md border border-accent-600 bg-accent-50 p-3 text-sm">Engagement accepted: the project is in your list, and what the contractor submits to you appears here.</p> : null}
      {invited.length ? (
        <section aria-labelledby="invites-h" className="mt-4 rounded-lg border border-amber-300 bg-amber-50 p-3 text-sm">
          <h2 id="invites-h" className="font-semibold">Engagements waiting for your answer</h2>
          <ul className="mt-1 space-y-1">
            {invited.map((e) => <li key={e.id} className="flex flex-wrap items-center gap-x-3 gap-y-1"><span>{e.organisationName}: {e.projectName} ({e.projectState})</span><AnswerForm engagementId={e.id} returnTo="/queue" project={e.projectName} answerAction={answerEngagementAction} /></li>)}
          </ul>
        </section>
      ) : null}
      <div className="mt-4 space-y-3">
        <QueueFilters contractors={contractors} contractor={one("contractor")} state={state ?? ""} />
        <QueueTable page={page} units={await readerUnits()} />
      </div>
      <Caution compact className="mt-6" />
    </>
  );
}

// Its 404/403 with the words in the server HTML (app/_lib/page-access.tsx).
export default refusable(QueuePage);
