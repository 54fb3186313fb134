/** What a server action answers a form with (shared by server actions and client forms). */
export interface ActionState {
  message?: string;
  ok?: boolean;
  fieldErrors?: Record<string, string[] | undefined>;
  /** What was typed, echoed back so a failed submit never empties the form (React resets it after an action). */
  values?: Record<string, string>;
}

/** The submitted text fields of a form, minus secrets, for ActionState.values; a field sent more than once (ticked boxes) joins its values with commas. */
export function typedValues(form: FormData, omit: string[] = ["password"]): Record<string, string> {
  const values: Record<string, string> = {};
  for (const [key, value] of form.entries()) {
    if (typeof value === "string" && !omit.includes(key) && !key.startsWith("$ACTION")) values[key] = key in values ? `${values[key]},${value}` : value;
  }
  return values;
}
