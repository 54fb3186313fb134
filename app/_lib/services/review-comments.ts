import "server-only";
import { pinnedCommentViews, type PinnedCommentView } from "@/components/design/pinned-comments";
import { pinnedCommentsOfLatestDecision, type PinnedCommentRow } from "@/db/queries/review-comments";
import type { UnitSystem } from "@/components/format/quantity";
import type { CurrentUser } from "../auth";

/**
 * The engineer's pinned comments the design editor shows beside their fields: those of the design's
 * latest decision at or before the revision shown, each marked resolved when the field's value in
 * that revision differs from the commented one's. Readable by the design's members and an engineer
 * engaged on its project (the editor's own readers).
 *
 * In two steps so the editor can read them at the same time as its access checks (one round trip
 * fewer before the page is sent): `readEditorPinnedComments` reads by the design's id and checks
 * nothing, and its rows may be turned into views (`editorPinnedComments`) only once the reader has
 * passed `designFor(…, { engaged: true })` for that design.
 */
export function readEditorPinnedComments(designId: string, shownNumber: number): Promise<PinnedCommentRow[]> {
  return pinnedCommentsOfLatestDecision(designId, shownNumber);
}

/** Views of rows read for a design the reader has passed the check on, in the reader's chosen units. */
export function editorPinnedComments(user: CurrentUser, rows: PinnedCommentRow[], shownInput: unknown, units: UnitSystem): PinnedCommentView[] {
  return pinnedCommentViews(rows, shownInput, user.timeZone, units);
}
