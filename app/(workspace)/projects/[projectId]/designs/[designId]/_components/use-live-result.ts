"use client";

import { useEffect, useMemo, useState } from "react";
import { DesignInputError, EngineInputError } from "@/engine/errors";
import { designInputSchema } from "@/engine/schema";
import { sizeParsedDesign } from "@/engine/size-design";
import type { DesignResult } from "@/engine/types";
import { sameResult } from "./same-result";

export type LiveStatus = "saved" | "fresh" | "invalid";

type Outcome = { ok: true; result: DesignResult } | { ok: false; message: string; fieldErrors: { path: string; message: string }[] };

/** The engine, here in the browser: the same validation and `sizeParsedDesign` the server runs on save. */
function liveOutcome(values: unknown): Outcome {
  const parsed = designInputSchema.safeParse(values);
  if (!parsed.success) {
    const n = parsed.error.issues.length;
    return { ok: false, message: `${n === 1 ? "1 field needs" : `${n} fields need`} fixing before results can update.`, fieldErrors: [] };
  }
  try {
    return { ok: true, result: sizeParsedDesign(parsed.data) };
  } catch (error) {
    // A range only the engine knows about: shown beside the field, as the server's 422 would be.
    if (error instanceof DesignInputError || error instanceof EngineInputError) {
      return { ok: false, message: error.issues.map((i) => i.message).join(" "), fieldErrors: error.issues };
    }
    throw error;
  }
}

/**
 * Results that follow the form at every change: validated and sized in the browser by the engine
 * itself, with no debounce and no network, so what is on screen is always the result of what is
 * in the form (typing away and back shows the first result again). While the form has errors the
 * last good result stays, marked as such. The server stays the authority: each save recomputes
 * and stores its own result, and when the form holds the saved input the two are compared —
 * `savedDiffers` is true when the saved result is not the one the engine gives here.
 */
export function useLiveResult(
  values: unknown,
  saved: { key: string; result: DesignResult },
  onFieldErrors: (errors: { path: string; message: string }[]) => void,
) {
  const key = JSON.stringify(values);
  // eslint-disable-next-line react-hooks/exhaustive-deps
  const outcome = useMemo(() => liveOutcome(values), [key]);
  const [lastGood, setLastGood] = useState<DesignResult>(() => (outcome.ok ? outcome.result : saved.result));
  if (outcome.ok && outcome.result !== lastGood) setLastGood(outcome.result);

  useEffect(() => {
    if (!outcome.ok && outcome.fieldErrors.length > 0) onFieldErrors(outcome.fieldErrors);
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [outcome]);

  const atSaved = key === saved.key;
  // Compared only while the form holds the saved input (on open and after each save).
  const savedDiffers = useMemo(() => atSaved && outcome.ok && !sameResult(outcome.result, saved.result), [atSaved, outcome, saved.result]);

  const result = outcome.ok ? outcome.result : lastGood;
  const status: LiveStatus = !outcome.ok ? "invalid" : atSaved ? "saved" : "fresh";
  return { result, status, message: outcome.ok ? "" : outcome.message, savedDiffers };
}
