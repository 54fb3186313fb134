"use client";

import { useRef, useState, type ComponentProps, type ComponentType, type ReactNode } from "react";
import type { RevisionsTable } from "./revisions-table";

type Props = ComponentProps<typeof RevisionsTable>;

/**
 * The editor's revisions table, below the fold of the heaviest page: drawn on the server first
 * (the children: links and a GET form, working without JavaScript, no table code in the first
 * load), and swapped for the browser's table, with its filter-as-you-type, when the reader first
 * points at, touches or tabs into it. The table library and the columns load only then, which
 * keeps them out of the editor's first load (13 kB gzip).
 */
export function RevisionsTableLazy({ children, ...props }: Props & { children: ReactNode }) {
  const [Loaded, setLoaded] = useState<ComponentType<Props> | null>(null);
  const started = useRef(false);
  const box = useRef<HTMLDivElement>(null);
  const load = () => {
    if (started.current) return;
    started.current = true;
    import("./revisions-table").then(
      (m) => {
        // Keep the keyboard where it was: the two tables give their controls the same ids.
        const focused = box.current?.contains(document.activeElement) ? document.activeElement?.id : undefined;
        setLoaded(() => m.RevisionsTable);
        if (focused) requestAnimationFrame(() => document.getElementById(focused)?.focus());
      },
      () => { started.current = false; }, // the server's table keeps working; try again on the next reach
    );
  };
  return (
    <div ref={box} onPointerEnter={load} onTouchStart={load} onFocus={load}>
      {Loaded ? <Loaded {...props} /> : children}
    </div>
  );
}
