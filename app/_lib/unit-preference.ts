import "server-only";
import { cookies } from "next/headers";
import type { UnitSystem } from "@/components/format/quantity";
import { parseUnitSystem, UNITS_COOKIE } from "@/components/format/unit-preference";

/** The reader's unit system for a server page or the PDF report (US units when none was chosen). */
export async function readerUnits(): Promise<UnitSystem> {
  return parseUnitSystem((await cookies()).get(UNITS_COOKIE)?.value);
}

/** The cookie's choice, or undefined when this browser has not chosen through it yet. */
export async function chosenUnits(): Promise<UnitSystem | undefined> {
  const value = (await cookies()).get(UNITS_COOKIE)?.value;
  return value ? parseUnitSystem(value) : undefined;
}
