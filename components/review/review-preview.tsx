"use client";

import { DesignPreviewLazy } from "@/components/preview";
import type { DesignInput, DesignResult } from "@/engine";
import type { UnitSystem } from "@/components/format/quantity";

/** The 3D preview, read-only, on the review page and the field spec (hidden when printing). */
export function ReviewPreview({ input, result, units = "imperial" }: { input: DesignInput; result: DesignResult; units?: UnitSystem }) {
  return (
    <section aria-label="3D preview" className="no-print rounded-lg border border-slate-200 bg-white p-4">
      <h2 className="mb-2 text-base font-semibold">Preview</h2>
      <DesignPreviewLazy input={input} result={result} unitSystem={units} readOnly showCaution={false} />
    </section>
  );
}
