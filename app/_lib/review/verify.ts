/**
 * The public approval check: one word for where an approval stands now, and the address an
 * inspector opens.
 */
import { env } from "@/app/_lib/env";

export type VerifyStatus = "current" | "superseded" | "on_hold";

export const VERIFY_STATUS_WORDS: Record<VerifyStatus, { title: string; detail: string }> = {
  current: { title: "Approved and current", detail: "This is the approved revision to build from." },
  superseded: { title: "Superseded by a newer approved revision", detail: "Do not build from this revision: a newer revision of the design was approved after it." },
  on_hold: { title: "On hold", detail: "The design is on hold: an as-built hole did not match the approved spec, and an engineer has not yet cleared it. No concrete is to be placed." },
};

export function verifyStatus(a: { superseded: boolean; onHold: boolean }): VerifyStatus {
  if (a.superseded) return "superseded";
  return a.onHold ? "on_hold" : "current";
}

export function verifyUrl(code: string): string {
  return `${env.appUrl}/verify/${code}`;
}

/** The city of a one-line US address "street, city, ST": the part before the state. */
export function cityOf(address: string, state: string): string {
  const parts = address.split(",").map((p) => p.trim()).filter(Boolean);
  if (parts.length >= 2 && parts[parts.length - 1].toUpperCase().startsWith(state.toUpperCase())) return parts[parts.length - 2];
  return parts.length >= 2 ? parts[parts.length - 1] : "";
}
