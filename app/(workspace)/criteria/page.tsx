import type { Metadata } from "next";
import Link from "next/link";
import { hasRole, requireUser } from "@/app/_lib/auth";
import { forPage, refusable } from "@/app/_lib/page-access";
import { US_STATES } from "@/app/_lib/schemas/project";
import { CriteriaCardView } from "@/components/design/criteria-card-view";
import { criteriaCardsPage } from "@/db/queries/criteria-cards";
import { CriteriaCardForm } from "./_components/criteria-card-form";
import { readerUnits } from "@/app/_lib/unit-preference";

export const metadata: Metadata = { title: "Design criteria cards" };

/**
 * The organisation's criteria cards, one per jurisdiction, entered once and applied to projects;
 * 20 to a page (`?page=`), by state then jurisdiction, so the page reads what it shows.
 */
async function CriteriaPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const user = await forPage(() => requireUser(), "/criteria");
  const units = await readerUnits();
  const search = await searchParams;
  const pageParam = Array.isArray(search.page) ? search.page[0] : search.page;
  const { cards, total, page, pageSize } = await criteriaCardsPage(user.organisationId, Number(pageParam ?? 1));
  const pages = Math.max(1, Math.ceil(total / pageSize));
  const first = (page - 1) * pageSize + 1;
  const canWrite = hasRole(user, "designer", "admin");
  return (
    <>
      <h1 className="text-2xl font-semibold">Design criteria cards</h1>
      <p className="mt-1 max-w-3xl text-sm text-slate-600">
        One card per jurisdiction: the codes in force, wind, exposure, snow, frost and presumed soil, each with its source and the date you checked it.
        Projects use a card so every design there starts from the same criteria. Re-check a card when the jurisdiction adopts new codes.
      </p>
      {total > pageSize ? (
        <p role="status" className="mt-4 text-sm text-slate-600">
          {cards.length ? `Cards ${first.toLocaleString("en-US")}–${(first + cards.length - 1).toLocaleString("en-US")} of ${total.toLocaleString("en-US")}` : `No cards on page ${page.toLocaleString("en-US")}; there are ${total.toLocaleString("en-US")}.`}
        </p>
      ) : null}
      <div className="mt-6 space-y-4">
        {total === 0 ? <p className="text-sm text-slate-600">No cards yet.</p> : cards.map((card) => (
          <section key={card.id} aria-labelledby={`card-${card.id}`} className="rounded-lg border border-slate-200 bg-white p-4">
            <div className="mb-3 flex flex-wrap items-baseline justify-between gap-2">
              <h2 id={`card-${card.id}`} className="text-lg font-semibold">{card.jurisdiction}, {card.state}</h2>
              {canWrite ? <Link href={`/criteria/${card.id}`} className="text-sm text-accent-800 hover:underline">Edit card</Link> : null}
            </div>
            <CriteriaCardView card={card} units={units} />
          </section>
        ))}
      </div>
      {total > pageSize ? (
        <nav aria-label="Card pages" className="mt-4 flex flex-wrap gap-x-6 gap-y-2 text-sm">
          {page > 1 ? <Link href={`/criteria?page=${Math.min(page - 1, pages)}`} className="font-medium text-accent-800 underline">Previous cards</Link> : null}
          {page < pages ? <Link href={`/criteria?page=${page + 1}`} className="font-medium text-accent-800 underline">Next cards</Link> : null}
          <span className="text-slate-600">Page {Math.min(page, pages).toLocaleString("en-US")} of {pages.toLocaleString("en-US")}</span>
        </nav>
      ) : null}
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
