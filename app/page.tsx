import Link from "next/link";
import { Brand } from "@/components/ui/brand";
import { Caution } from "@/components/ui/caution";
import { SITE_CAUTION_TEXTS } from "@/engine/notices";
import { sayIn } from "@/components/format/quantity-text";
import { readerUnits } from "@/app/_lib/unit-preference";
import { SkipLink } from "@/components/ui/skip-link";

const ROLES = [
  {
    title: "Designers at solar contractors",
    body: "Enter the site (wind speed, exposure, snow, soil, frost depth, slope) and the array (modules, rows and columns, tilt, clearance, posts). See wind on the tilted array, loads per post, footing diameter and depth, and concrete to order as you type.",
  },
  {
    title: "Reviewing licensed engineers",
    body: "Open one exact revision with every input, assumption, code section and check ratio in view. Approve it, or request changes with comments pinned to the inputs. An approval pins that revision; any edit makes a new one.",
  },
  {
    title: "Install crews",
    body: "On a phone, open the approved field spec: hole size and depth per post, concrete to order, post cut lengths from a laser reading, tilt setting and cautions. Log as-built depths and photos from the hole.",
  },
];

export default async function LandingPage() {
  // The site cautions name concrete strengths: in the units this browser chose (the units cookie).
  const units = await readerUnits();
  return (
    <div className="mx-auto flex min-h-screen max-w-5xl flex-col px-5 py-6">
      <SkipLink />
      <header className="flex items-center justify-between">
        <Brand />
        <Link href="/login" className="rounded-md bg-accent-700 px-4 py-2 text-sm font-medium text-white hover:bg-accent-800">
          Sign in
        </Link>
      </header>

      <main id="content" tabIndex={-1} className="flex-1 py-12 focus:outline-none">
        <h1 className="max-w-3xl text-3xl font-semibold tracking-tight sm:text-4xl">
          Post footings for ground-mounted solar arrays, sized, reviewed and ready to dig.
        </h1>
        <p className="mt-4 max-w-2xl text-lg text-slate-600">
          A fixed-tilt array is a sail on a few legs. Pierwise works out the wind and snow on it, the shear,
          overturning moment and uplift at each post, and the concrete footing that holds it — then carries that
          design through a licensed engineer&apos;s review to a field spec the crew can build from.
        </p>
        <Caution className="mt-6 max-w-3xl" />

        <section className="mt-10 grid gap-4 sm:grid-cols-3" aria-label="Who Pierwise is for">
          {ROLES.map((role) => (
            <article key={role.title} className="rounded-lg border border-slate-200 bg-white p-5">
              <h2 className="font-semibold">{role.title}</h2>
              <p className="mt-2 text-sm text-slate-600">{role.body}</p>
            </article>
          ))}
        </section>

        <section className="mt-10 max-w-3xl" aria-labelledby="methods">
          <h2 id="methods" className="font-semibold">Methods, stated</h2>
          <p className="mt-2 text-sm text-slate-600">
            Wind by ASCE 7-16 or 7-22 velocity pressure with open-monoslope net pressure coefficients; allowable-stress
            load combinations; embedded-post footings by IBC §1807.3 with Table 1806.2 soil values or the
            engineer&apos;s own. Every result names the edition and section it used and flags each method limit.
          </p>
        </section>

        <section className="mt-8 max-w-3xl" aria-labelledby="site-safety">
          <h2 id="site-safety" className="font-semibold">On site, always</h2>
          <ul className="mt-2 list-disc space-y-1 pl-5 text-sm text-slate-600">
            {SITE_CAUTION_TEXTS.map((c, i) => (
              <li key={i}>{sayIn(c, units)}</li>
            ))}
          </ul>
        </section>
      </main>

      <footer className="border-t border-slate-200 pt-4 text-xs text-slate-500">
        Pierwise — preliminary sizing software. Not a substitute for a licensed engineer&apos;s design.
      </footer>
    </div>
  );
}
