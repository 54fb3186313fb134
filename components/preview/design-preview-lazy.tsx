"use client";
import dynamic from "next/dynamic";
import type { DesignPreviewProps } from "./design-preview";

/** Keeps three.js and the scene out of the host page's first load; a box of the same height meanwhile. */
export const DesignPreviewLazy = dynamic<DesignPreviewProps>(() => import("./design-preview"), {
  ssr: false,
  loading: () => (
    <div role="status" className="flex h-[440px] items-center justify-center rounded-lg border border-slate-200 bg-slate-50 text-sm text-slate-500">
      Loading the 3D preview…
    </div>
  ),
});
