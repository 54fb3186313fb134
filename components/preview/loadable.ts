/**
 * A module loaded on demand, once: its value once there (or why it failed), with a change signal
 * so React can render it without Suspense (use-loadable.ts). No React here.
 */
/** A module being loaded: its value once there (or why it failed), with a change signal for React. */
export interface Loadable<T> {
  load: () => Promise<T>;
  /** The same object until the load settles (a stable snapshot for useSyncExternalStore). */
  state: () => { value: T | null; error: unknown };
  subscribe: (listener: () => void) => () => void;
}

export function loadable<T>(start: () => Promise<T>): Loadable<T> {
  let promise: Promise<T> | null = null;
  let state: { value: T | null; error: unknown } = { value: null, error: null };
  const listeners = new Set<() => void>();
  const settle = (next: typeof state) => {
    state = next;
    for (const l of listeners) l();
  };
  return {
    load: () => (promise ??= start().then(
      (value) => {
        settle({ value, error: null });
        return value;
      },
      (error: unknown) => {
        settle({ value: null, error: error ?? new Error("The 3D preview's code could not be loaded.") });
        throw error;
      },
    )),
    state: () => state,
    subscribe: (listener) => {
      listeners.add(listener);
      return () => listeners.delete(listener);
    },
  };
}
