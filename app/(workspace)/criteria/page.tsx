import type { Metadata } from "next";
import Link from "next/link";
import { hasRole, requireUser } from "@/app/_lib/auth";
import { forPage, refusable } from "@/app/_lib/page-access";
import { US_STATES } from "@/app/_lib/schemas/project";
import { CriteriaCardView } from "@/components/design/criteria-card-view";
import { listCriteriaCards } from "@/db/queries/criteria-cards";
import { CriteriaCardForm } from "./_components/criteria-card-form";
import { readerUnits } from "@/app/_lib/unit-preference";

export const metadata: Metadata = { title: "Design criteria cards" };

/** The organisation's criteria cards, one per jurisdiction, entered once and applied to projects. */
async function CriteriaPage() {
  const user = await forPage(() => requireUser(), "/criteria");
  const units = await readerUnits();
  const cards = await listCriteriaCards(user.organisationId);
  const canWrite = hasRole(user, "designer", "admin");
  return (
    <>
      <h1 className="text-2xl font-semibold">Design criteria cards</h1>
      <p className="mt-1 max-w-3xl text-sm text-slate-600">
        One card per jurisdiction: the codes in force, wind, exposure, snow, frost and presumed soil, each with its source and the date you checked it.
        Projects use a card so every design there starts from the same criteria. Re-check a card when the jurisdiction adopts new codes.
      </p>
      <div className="mt-6 space-y-4">
        {cards.length === 0 ? <p className="text-sm text-slate-600">No cards yet.</p> : cards.map((card) => (
          <section key={card.id} aria-labelledby={`card-${card.id}`} className="rounded-lg border border-slate-200 bg-white p-4">
            <div className="mb-3 flex flex-wrap items-baseline justify-between gap-2">
              <h2 id={`card-${card.id}`} className="text-lg font-semibold">{card.jurisdiction}, {card.state}</h2>
              {canWrite ? <Link href={`/criteria/${card.id}`} className="text-sm text-accent-800 hover:underline">Edit card</Link> : null}
            </div>
            <CriteriaCardView card={card} units={units} />
          </section>
        ))}
      </div>
      {canWrite ? (
        <section aria-labelledby="new-card" className="mt-8">
          <h2 id="new-card" className="mb-2 text-lg font-semibold">Add a card</h2>
          <CriteriaCardForm states={US_STATES} timeZone={user.timeZone} units={units} />
        </section>
      ) : null}
    </>
  );
}

// Its 404/403 with the words in the server HTML (app/_lib/page-access.tsx).
export default refusable(CriteriaPage);
