"use client";

import { useEffect, useRef, useState } from "react";

/**
 * Unsaved editor inputs are kept in this browser until they are saved or discarded: a reload or a
 * closed tab brings them back with a notice, and leaving with unsaved edits asks first. A draft
 * belongs to the revision it was typed over, so a draft over an older revision is never applied to
 * a newer one.
 */
interface Draft<T> {
  values: T;
  savedAt: string;
}

const PREFIX = "pierwise-draft:";

function readDraft<T>(key: string): Draft<T> | null {
  try {
    const raw = window.localStorage.getItem(key);
    return raw ? (JSON.parse(raw) as Draft<T>) : null;
  } catch {
    return null;
  }
}

export function useEditorDraft<T>({ designId, baseRevisionId, values, dirty, restore, enabled }: {
  designId: string;
  baseRevisionId: string;
  values: T;
  dirty: boolean;
  restore: (values: T) => void;
  enabled: boolean;
}) {
  const key = `${PREFIX}${designId}:${baseRevisionId}`;
  const [restoredAt, setRestoredAt] = useState<string | null>(null);
  const restoreRef = useRef(restore);
  restoreRef.current = restore;

  // Once per revision opened: bring back what was typed over it and not saved.
  useEffect(() => {
    if (!enabled) return;
    const draft = readDraft<T>(key);
    if (draft) {
      restoreRef.current(draft.values);
      setRestoredAt(draft.savedAt);
    }
  }, [key, enabled]);

  // A save moves the editor onto the new revision: the draft typed over the old one is done with.
  const previousKey = useRef(key);
  useEffect(() => {
    if (previousKey.current !== key) window.localStorage.removeItem(previousKey.current);
    previousKey.current = key;
  }, [key]);

  useEffect(() => {
    if (!enabled) return;
    try {
      if (dirty) window.localStorage.setItem(key, JSON.stringify({ values, savedAt: new Date().toISOString() }));
      else window.localStorage.removeItem(key);
    } catch {
      // A full or blocked storage only loses the safety net, never the typing itself.
    }
  }, [key, values, dirty, enabled]);

  useEffect(() => {
    if (!enabled || !dirty) return;
    const warn = (event: BeforeUnloadEvent) => {
      event.preventDefault();
      // Older browsers show the prompt only when a return value is set.
      event.returnValue = "";
    };
    window.addEventListener("beforeunload", warn);
    return () => window.removeEventListener("beforeunload", warn);
  }, [dirty, enabled]);

  const discard = () => {
    window.localStorage.removeItem(key);
    setRestoredAt(null);
  };
  return { restoredAt, dismiss: () => setRestoredAt(null), discard };
}

/**
 * Enter in a text or number field moves to the next field instead of submitting: a revision is
 * permanent, so only the Save button makes one.
 */
export function enterMovesToNextField(event: React.KeyboardEvent<HTMLFormElement>): void {
  const target = event.target as HTMLElement;
  if (event.key !== "Enter" || !(target instanceof HTMLInputElement)) return;
  if (["submit", "button", "checkbox", "radio", "file"].includes(target.type)) return;
  event.preventDefault();
  const fields = Array.from(event.currentTarget.querySelectorAll<HTMLElement>("input, select, textarea")).filter(
    (el) => !(el as HTMLInputElement).disabled && el.getAttribute("type") !== "hidden" && el.offsetParent !== null,
  );
  const next = fields[fields.indexOf(target) + 1];
  next?.focus();
}
