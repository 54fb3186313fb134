"use client";

import { startTransition, useActionState, useEffect, useRef } from "react";
import type { ActionState } from "./action-state";

/**
 * A form action that never throws away what was typed or chosen.
 *
 * React resets a form after its action runs, and a reset puts selects back on their first render's
 * choice and empties file inputs (a crew member who only fixes a depth would log the hole against
 * the wrong post, without its photos). With JavaScript the submit is taken over here, so the browser
 * keeps every field, selected option and chosen file until the save succeeds; without JavaScript the
 * form posts as usual and the server echoes the text fields back through `state.values`.
 */
export function useKeptForm(
  action: (state: ActionState, form: FormData) => Promise<ActionState>,
  { resetOnSuccess = false, validate }: { resetOnSuccess?: boolean; validate?: (event: React.FormEvent<HTMLFormElement>) => void } = {},
) {
  const [state, dispatch, pending] = useActionState<ActionState, FormData>(action, {});
  const ref = useRef<HTMLFormElement>(null);
  useEffect(() => {
    // Only a save that went through clears the form, and only where the next entry starts empty.
    if (resetOnSuccess && state.ok) ref.current?.reset();
  }, [state, resetOnSuccess]);
  const onSubmit = (event: React.FormEvent<HTMLFormElement>) => {
    // A client-side check that refuses the form prevents the default: nothing is sent then.
    validate?.(event);
    if (event.defaultPrevented) return;
    event.preventDefault();
    const form = new FormData(event.currentTarget, (event.nativeEvent as SubmitEvent).submitter);
    startTransition(() => dispatch(form));
  };
  return { state, pending, formProps: { ref, action: dispatch, onSubmit } };
}
