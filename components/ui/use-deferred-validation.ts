"use client";

import { useRef, useState, type FormEvent } from "react";

/** A form's check in the browser: its field errors, or undefined when the form is fine. */
export type FormCheck = (form: FormData) => Record<string, string[] | undefined> | undefined;

/**
 * useClientValidation for a page whose only form is small: the check (and zod with it) loads when
 * the person first focuses the form, so the page does not ship the validator on first load. Until
 * it has loaded the form simply goes to the server, which checks it in any case.
 */
export function useDeferredValidation(load: () => Promise<FormCheck>) {
  const [errors, setErrors] = useState<Record<string, string[] | undefined>>();
  const check = useRef<FormCheck | null>(null);
  const requested = useRef(false);
  function onFocus() {
    if (requested.current) return;
    requested.current = true;
    load().then((fn) => { check.current = fn; }, () => { requested.current = false; });
  }
  function onSubmit(event: FormEvent<HTMLFormElement>) {
    if (!check.current) return;
    const found = check.current(new FormData(event.currentTarget));
    setErrors(found);
    if (found) event.preventDefault();
  }
  return { clientErrors: errors, onSubmit, onFocus };
}
