import { imperialText, says, type QuantityText } from "@/engine/quantity-text";
import { composedIn } from "./quantity-text";
import type { UnitSystem } from "./quantity";

/**
 * Revision 1's note when the app writes it (a design made from the criteria card or the defaults):
 * where it started and how the engine sized it. Saved as customary words; every screen shows it
 * through `revisionNoteIn`, which words its sizes in the reader's units. A note a person typed is
 * their own words and is shown as typed.
 */
export function startingNoteText(startedFrom: string, start: { pass: boolean; changesText: QuantityText[]; adviceText: QuantityText[] }): QuantityText {
  const changed = start.changesText.length ? says` Sized: ${start.changesText.flatMap((c, i) => (i === 0 ? c : ["; ", ...c]))}.` : [];
  if (start.pass) return says`${startedFrom} Every check passes.${changed}`;
  return says`${startedFrom} Fails a check at this size.${changed} To pass: ${start.adviceText.flatMap((a, i) => (i === 0 ? a : [" ", ...a]))}`;
}

export function startingNote(startedFrom: string, start: Parameters<typeof startingNoteText>[1]): string {
  return imperialText(startingNoteText(startedFrom, start));
}

// What `startingNoteText` begins with; the card's own name (a person's words) is left as typed.
const STARTING_NOTE = /^(Started from the (?:.+ criteria card|default design)\.) (?=Every check passes\.|Fails a check at this size\.)/s;

/** A revision's note in the reader's units when the app wrote it; a person's note exactly as typed. */
export function revisionNoteIn(note: string, system: UnitSystem): string;
export function revisionNoteIn(note: string | null | undefined, system: UnitSystem): string | null | undefined;
export function revisionNoteIn(note: string | null | undefined, system: UnitSystem): string | null | undefined {
  if (!note) return note;
  const m = STARTING_NOTE.exec(note);
  return m ? `${m[0]}${composedIn(note.slice(m[0].length), system)}` : note;
}
