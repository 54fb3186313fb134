import "server-only";
import { pinnedCommentViews, type PinnedCommentView } from "@/components/design/pinned-comments";
import { pinnedCommentsOfLatestDecision } from "@/db/queries/review-comments";
import type { CurrentUser } from "../auth";
import { designFor } from "../designs";
import { readerUnits } from "../unit-preference";

/**
 * The engineer's pinned comments the design editor shows beside their fields: those of the design's
 * latest decision at or before the revision shown, each marked resolved when the field's value in
 * that revision differs from the commented one's. Readable by the design's members and an engineer
 * engaged on its project (the editor's own readers).
 */
export async function editorPinnedComments(user: CurrentUser, designId: string, shown: { number: number; input: unknown }): Promise<PinnedCommentView[]> {
  const design = await designFor(user, designId, { engaged: true });
  const rows = await pinnedCommentsOfLatestDecision(design.id, shown.number);
  // Values in the reader's chosen units (the same cookie the review page reads).
  return pinnedCommentViews(rows, shown.input, user.timeZone, await readerUnits());
}
