import type { Metadata } from "next";
import Link from "next/link";
import { requireUser } from "@/app/_lib/auth";
import { assertCanWrite, cardFor } from "@/app/_lib/designs";
import { forPage, refusable } from "@/app/_lib/page-access";
import { US_STATES } from "@/app/_lib/schemas/project";
import { readerUnits } from "@/app/_lib/unit-preference";
import { CriteriaCardForm } from "../_components/criteria-card-form";

export const metadata: Metadata = { title: "Edit criteria card" };

async function EditCardPage({ params }: { params: Promise<{ cardId: string }> }) {
  const { cardId } = await params;
  const { card, timeZone } = await forPage(async () => {
    const u = await requireUser();
    const c = await cardFor(u, cardId);
    assertCanWrite(u);
    return { card: c!, timeZone: u.timeZone };
  }, `/criteria/${cardId}`);
  return (
    <>
      <p className="text-sm"><Link href="/criteria" className="text-accent-800 hover:underline">← Criteria cards</Link></p>
      <h1 className="mt-2 mb-1 text-2xl font-semibold">{card.jurisdiction}, {card.state}</h1>
      <p className="mb-4 text-sm text-slate-600">Changes apply to new designs; saved revisions keep the values they were saved with.</p>
      <CriteriaCardForm card={card} states={US_STATES} timeZone={timeZone} units={await readerUnits()} />
    </>
  );
}

// Its 404/403 with the words in the server HTML (app/_lib/page-access.tsx).
export default refusable(EditCardPage);
