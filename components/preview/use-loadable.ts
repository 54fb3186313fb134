"use client";
import { useEffect, useSyncExternalStore } from "react";
import type { Loadable } from "./loadable";

const NOTHING = { value: null, error: null };
const serverState = () => NOTHING;

/**
 * The loaded module, or null while it loads (and on the server and during hydration, which then
 * renders the placeholder the server sent). Starts the load when `enabled`. Not a lazy component
 * in Suspense on purpose: React holds a resolved Suspense boundary back (up to 300 ms after its
 * placeholder showed), and the preview should draw the moment its code is there. A failed load
 * throws here, for the nearest error boundary.
 */
export function useLoadable<T>(module: Loadable<T>, enabled = true): T | null {
  const state = useSyncExternalStore(module.subscribe, module.state, serverState as () => { value: T | null; error: unknown });
  useEffect(() => {
    if (enabled) module.load().catch(() => undefined);
  }, [module, enabled]);
  if (state.error) throw state.error;
  return state.value;
}
