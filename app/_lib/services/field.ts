import "server-only";
import { assertRole, type CurrentUser } from "../auth";
import { asBuiltSchema, recordAsBuilt as recordHole } from "../review/as-built";
import { clearHold as clearHoldRow, clearHoldSchema, holdFor } from "../review/holds";
import { ownedRevision } from "../review/workflow";
import type { Body } from "./input";

/** The crew (installers, engineers) records one hole of an approved revision; a hole that contradicts the spec puts the design on hold. */
export async function recordAsBuilt(user: CurrentUser, revisionId: string, body: Body, photos: File[]) {
  const revision = await ownedRevision(user, revisionId);
  assertRole(user, "installer", "engineer");
  const input = asBuiltSchema.parse(await body());
  return recordHole(user, revision, input, photos);
}

/** An engineer clears a hold, saying how it was resolved and confirming work may go on; those on the revision are e-mailed. */
export async function clearHold(user: CurrentUser, holdId: string, body: Body): Promise<{ told: string[] }> {
  // An outside engineer engaged on the hold's project may clear it too.
  const hold = await holdFor(user, holdId);
  assertRole(user, "engineer");
  const { note } = clearHoldSchema.parse(await body());
  return clearHoldRow(user, hold, note);
}
