"use client";

import { useState, type FormEvent } from "react";
import { z } from "zod";

/**
 * Checks a form with the same zod schema the server action uses before it is sent, so mistakes
 * show beside the field at once; the server checks again (the client can be bypassed).
 */
export function useClientValidation(schema: z.ZodType, toInput: (form: FormData) => unknown) {
  const [errors, setErrors] = useState<Record<string, string[] | undefined>>();
  function onSubmit(event: FormEvent<HTMLFormElement>) {
    const parsed = schema.safeParse(toInput(new FormData(event.currentTarget)));
    if (parsed.success) return setErrors(undefined);
    event.preventDefault();
    setErrors(z.flattenError(parsed.error).fieldErrors as Record<string, string[] | undefined>);
  }
  return { clientErrors: errors, onSubmit };
}
