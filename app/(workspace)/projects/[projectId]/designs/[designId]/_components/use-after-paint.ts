"use client";

import { startTransition, useEffect, useState } from "react";

/**
 * `value`, handed on only after the frame that shows it has been painted, as an interruptible
 * update: the 3D preview's re-render and redraw then never hold up the paint of the numbers a
 * keystroke changed, and a burst of keystrokes redraws the preview once, for the last of them.
 */
export function useAfterPaint<T>(value: T): T {
  const [shown, setShown] = useState(value);
  useEffect(() => {
    if (Object.is(shown, value)) return;
    let timer: ReturnType<typeof setTimeout> | undefined;
    const frame = requestAnimationFrame(() => {
      timer = setTimeout(() => startTransition(() => setShown(value)), 0);
    });
    return () => {
      cancelAnimationFrame(frame);
      clearTimeout(timer);
    };
  }, [value, shown]);
  return shown;
}
