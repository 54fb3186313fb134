"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import Link from "next/link";
import { useRouter } from "next/navigation";
import { memo, useDeferredValue, useEffect, useMemo, useState } from "react";
import { FormProvider, useForm, useWatch, type FieldValues } from "react-hook-form";
import { applyCriteriaCard } from "@/app/_lib/design-defaults";
import { formatFootingSize, type UnitSystem } from "@/components/format/quantity";
import { parseUnitSystem, UNITS_STORAGE_KEY } from "@/components/format/unit-preference";
import { UnitsSwitch } from "@/components/format/units-switch";
import { DesignPreviewLazy } from "@/components/preview";
import { Caution } from "@/components/ui/caution";
import type { CriteriaCardValues } from "@/db/queries/criteria-cards";
// The engine's modules themselves, not its index: the editor needs validation and sizing only.
import { designInputSchema, type DesignInput, type DesignInputDraft } from "@/engine/schema";
import type { DesignResult } from "@/engine/types";
import { ArrayGroup, PostsGroup, SiteGroup } from "./input-groups";
import { FootingHeadline, ResultsPanel } from "./results-panel";
import { useAfterPaint } from "./use-after-paint";
import { useLiveResult, type LiveStatus } from "./use-live-result";
import { enterMovesToNextField, useEditorDraft } from "./use-editor-draft";
import { PinnedCommentsPanel, PinnedCommentsProvider, pinnedByPath } from "./pinned-comments";
import type { PinnedCommentView } from "@/components/design/pinned-comments";

/**
 * The designer's editor: inputs on the left, live results on the right (stacked on a phone), the
 * defer-to-code caution always in view. Saving posts a new revision from `baseRevisionId`; if
 * someone saved since, the server answers 409 and the form keeps what was typed.
 */
export interface EditorProps {
  designId: string;
  initialInput: DesignInput;
  initialResult: DesignResult;
  baseRevisionId: string;
  baseNumber: number;
  readOnly: boolean;
  card: { label: string; values: CriteriaCardValues } | null;
  /** The engineer's comments pinned to inputs (latest decision), shown beside their fields. */
  pinnedComments?: PinnedCommentView[];
  /** The reader's unit system from the preference cookie (absent: from this browser's storage). */
  units?: UnitSystem;
}

// Each field follows its own value (useController), so the groups need not re-render at every keystroke.
const SiteInputs = memo(SiteGroup);
const ArrayInputs = memo(ArrayGroup);
const PostsInputs = memo(PostsGroup);

type Conflict = { message: string; latestRevisionId: string | null; latestNumber: number | null };

const STATUS_TEXT: Record<LiveStatus, string> = {
  saved: "Showing the saved revision.",
  fresh: "Up to date with your inputs (not saved yet).",
  invalid: "",
};

export function DesignEditor(props: EditorProps) {
  const router = useRouter();
  // The server renders in the cookie's units (no flash); a browser that only has the older
  // localStorage choice still gets it after the first paint.
  const [units, setUnits] = useState<UnitSystem>(props.units ?? "imperial");
  useEffect(() => {
    if (props.units) return;
    const stored = window.localStorage.getItem(UNITS_STORAGE_KEY);
    if (stored) setUnits(parseUnitSystem(stored));
  }, [props.units]);

  const form = useForm<DesignInputDraft, unknown, DesignInput>({ resolver: zodResolver(designInputSchema), defaultValues: props.initialInput, mode: "onChange" });
  const values = useWatch({ control: form.control });
  const [initialKey] = useState(() => JSON.stringify(props.initialInput));
  const setFieldErrors = (errors: { path: string; message: string }[]) => {
    for (const e of errors) form.setError(e.path.replace(/^input\./, "") as never, { type: "server", message: e.message });
  };
  const [saved, setSaved] = useState({ key: initialKey, result: props.initialResult });
  const live = useLiveResult(values, saved, setFieldErrors);

  const [base, setBase] = useState({ id: props.baseRevisionId, number: props.baseNumber });
  const [note, setNote] = useState("");
  const [saving, setSaving] = useState(false);
  const [saveMessage, setSaveMessage] = useState<{ ok: boolean; text: string } | null>(null);
  const [conflict, setConflict] = useState<Conflict | null>(null);
  const dirty = JSON.stringify(values) !== saved.key;
  const draft = useEditorDraft({
    designId: props.designId, baseRevisionId: base.id, values, dirty, enabled: !props.readOnly,
    restore: (draftValues) => form.reset(draftValues as DesignInputDraft, { keepDefaultValues: true }),
  });

  async function save(input: DesignInput, baseId = base.id) {
    setSaving(true);
    setSaveMessage(null);
    try {
      const response = await fetch(`/api/designs/${props.designId}/revisions`, {
        method: "POST",
        headers: { "content-type": "application/json" },
        body: JSON.stringify({ baseRevisionId: baseId, input, note }),
      });
      const json = await response.json().catch(() => ({}));
      if (response.status === 201) {
        setBase({ id: json.revision.id, number: json.revision.number });
        // The server's own result for what was saved: compared with the live one from here on.
        setSaved({ key: JSON.stringify(form.getValues()), result: json.revision.result ?? live.result });
        setConflict(null);
        setNote("");
        setSaveMessage({ ok: true, text: `Saved as revision ${json.revision.number}.` });
        router.refresh();
      } else if (response.status === 409) {
        setConflict({ message: json.errors?.[0]?.message ?? "Someone saved this design since you opened it.", latestRevisionId: json.latestRevisionId ?? null, latestNumber: json.latestNumber ?? null });
      } else if (response.status === 422) {
        setFieldErrors(json.errors ?? []);
        setSaveMessage({ ok: false, text: "Not saved: fix the fields marked in red. Nothing you typed was lost." });
      } else {
        setSaveMessage({ ok: false, text: json.errors?.[0]?.message ?? "Not saved: the server did not answer. Your inputs are still here; try again." });
      }
    } catch {
      setSaveMessage({ ok: false, text: "Not saved: could not reach the server. Your inputs are still here; try again." });
    } finally {
      setSaving(false);
    }
  }

  const onSubmit = form.handleSubmit((input) => save(input), () => setSaveMessage({ ok: false, text: "Not saved: fix the fields marked in red first." }));
  // Stable across keystrokes, so the memoised input groups do not re-render with every change
  // (each field follows its own value).
  const cardOffer = useMemo(() => props.card ? {
    label: props.card.label,
    apply: () => {
      const next = applyCriteriaCard(form.getValues(), props.card!.values);
      form.setValue("site", next.site, { shouldValidate: true, shouldDirty: true });
    },
  } : null, [props.card, form]);

  const pinned = useMemo(() => pinnedByPath(props.pinnedComments ?? []), [props.pinnedComments]);

  // A read-only revision shows what was saved (the record) even where today's engine differs.
  const result = props.readOnly && live.savedDiffers ? saved.result : live.result;
  // The 3D preview follows once the numbers are painted, so a keystroke never waits for a redraw.
  const previewResult = useAfterPaint(result);
  // The long result tables follow a keystroke in an interruptible render after its frame.
  const detailResult = useDeferredValue(result);
  const stale = live.status === "invalid";
  const statusLine = stale ? live.message : STATUS_TEXT[live.status];

  return (
    <FormProvider {...(form as unknown as import("react-hook-form").UseFormReturn<FieldValues>)}>
      <form onSubmit={onSubmit} onKeyDown={enterMovesToNextField} noValidate className="grid grid-cols-1 gap-6 pb-40 lg:grid-cols-[minmax(0,1fr)_minmax(0,30rem)] lg:pb-0">
        <div className="min-w-0 space-y-4">
          <div className="flex flex-wrap items-center justify-between gap-3">
            {/* The editor re-renders itself at once; the refresh brings the server-rendered parts of the page (revisions table) along, keeping what was typed. */}
            <UnitsSwitch units={units} onChange={(u) => { setUnits(u); router.refresh(); }} />
            {props.readOnly ? <p className="text-sm text-slate-600">Read only.</p> : null}
          </div>

          {draft.restoredAt ? (
            <div role="status" className="flex flex-wrap items-center gap-3 rounded-md border border-sky-300 bg-sky-50 px-3 py-2 text-sm text-sky-950">
              <span>Your unsaved inputs from this browser were brought back. They are not a revision until you save.</span>
              <button type="button" onClick={() => { draft.discard(); form.reset(JSON.parse(saved.key)); }} className="rounded-md border border-sky-400 bg-white px-3 py-1">Discard them</button>
              <button type="button" onClick={draft.dismiss} className="rounded-md px-2 py-1 underline">Keep editing</button>
            </div>
          ) : null}
          <PinnedCommentsPanel comments={props.pinnedComments ?? []} />
          <PinnedCommentsProvider comments={pinned}>
            <fieldset disabled={props.readOnly} className="space-y-4">
              <SiteInputs units={units} card={cardOffer} />
              <ArrayInputs units={units} />
              <PostsInputs units={units} />
            </fieldset>
          </PinnedCommentsProvider>

          {!props.readOnly ? (
            <div className="rounded-lg border border-slate-200 bg-white p-4">
              <h2 className="text-base font-semibold">Save a revision</h2>
              <p className="text-xs text-slate-500">Every save is kept as a new revision; earlier revisions never change. You are editing from revision {base.number}.</p>
              <div className="mt-3 flex flex-wrap items-end gap-3">
                <div className="min-w-56 flex-1 space-y-1">
                  <label htmlFor="revision-note" className="block text-sm font-medium text-slate-800">What changed</label>
                  <input id="revision-note" value={note} onChange={(e) => setNote(e.target.value)} maxLength={500} placeholder={units === "metric" ? "e.g. county confirmed 56 m/s" : "e.g. county confirmed 125 mph"} className="block w-full rounded-md border border-slate-300 px-3 py-2 text-sm" />
                </div>
                <button type="submit" disabled={saving} className="rounded-md bg-accent-700 px-4 py-2 text-sm font-medium text-white hover:bg-accent-800 disabled:opacity-60">{saving ? "Saving…" : "Save revision"}</button>
              </div>
              <p aria-live="polite" className={`mt-2 text-sm ${saveMessage?.ok === false ? "font-medium text-red-700" : "text-accent-800"}`}>
                {saveMessage?.text ?? (dirty ? "You have unsaved changes." : "")}
              </p>
              {conflict ? (
                <div role="alert" className="mt-2 rounded-md border border-amber-300 bg-amber-50 p-3 text-sm text-amber-950">
                  <p className="font-medium">Not saved: {conflict.message}</p>
                  <div className="mt-2 flex flex-wrap gap-2">
                    <button type="button" onClick={() => window.location.assign(window.location.pathname)} className="rounded-md border border-amber-400 bg-white px-3 py-1">Reload the latest (discards what you typed)</button>
                    {conflict.latestRevisionId ? (
                      <button type="button" onClick={form.handleSubmit((input) => save(input, conflict.latestRevisionId!))} className="rounded-md border border-amber-400 bg-white px-3 py-1">Save mine as revision {(conflict.latestNumber ?? 0) + 1} anyway</button>
                    ) : null}
                  </div>
                </div>
              ) : null}
            </div>
          ) : null}
        </div>

        <aside aria-label="Results" className="min-w-0 space-y-3 lg:sticky lg:top-3 lg:max-h-[calc(100vh-1.5rem)] lg:self-start lg:overflow-y-auto lg:pr-1">
          <Caution compact />
          <div className="flex items-center justify-between gap-2">
            <h2 className="text-base font-semibold">Results</h2>
            <p aria-live="polite" role="status" className={`text-xs ${stale ? "font-medium text-red-700" : "text-slate-500"}`}>
              {statusLine}
            </p>
          </div>
          {live.savedDiffers ? (
            <p role="alert" className="rounded-md border border-amber-300 bg-amber-50 px-3 py-2 text-sm text-amber-950">
              <span className="font-medium">Saved result differs from the live one.</span>{" "}
              {saved.result.engineVersion !== live.result.engineVersion
                ? `The saved revision was sized by engine ${saved.result.engineVersion}; this page runs engine ${live.result.engineVersion}.`
                : "Both come from the same engine version."}{" "}
              {props.readOnly ? "The saved result is shown." : "The live result is shown; saving again stores the server's result for these inputs."}
            </p>
          ) : null}
          <div className={`space-y-3 transition-opacity ${stale ? "opacity-60" : ""}`}>
            <FootingHeadline result={result} units={units} />
            {/* 3D preview slot (components/preview, built by the preview engineer). */}
            <DesignPreviewLazy input={previewResult.input} result={previewResult} unitSystem={units} readOnly={props.readOnly} height={300} showCaution={false} />
            <ResultsPanel result={result} detailResult={detailResult} units={units} />
          </div>
        </aside>

        {/* Phone: the caution and the footing stay in view at the bottom of the screen. */}
        <div className="fixed inset-x-0 bottom-0 z-20 border-t border-amber-300 bg-amber-50/95 px-3 py-2 text-xs text-amber-950 shadow-lg backdrop-blur lg:hidden">
          <p className="font-semibold text-slate-900">
            {formatFootingSize(result.footing.diameterIn, result.footing.depthIn, units)} · {result.footing.pass ? "passes" : "FAILS a check"}
            {stale ? " · results paused" : ""}
          </p>
          <p><strong>Caution:</strong> preliminary sizing only. The code, the authority having jurisdiction and a licensed engineer govern.{" "}<Link href="#res-checks" className="underline">Details</Link></p>
        </div>
      </form>
    </FormProvider>
  );
}
