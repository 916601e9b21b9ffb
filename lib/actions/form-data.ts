const SECRET_FIELDS = /password|token/i;

/** FormData → plain object; repeated keys become arrays, `$ACTION_` keys of Next are dropped. */
export function formDataToObject(form: FormData): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  for (const [key, value] of form.entries()) {
    if (key.startsWith("$ACTION")) continue;
    const v = typeof value === "string" ? value : value;
    if (key in out) {
      const existing = out[key];
      out[key] = Array.isArray(existing) ? [...existing, v] : [existing, v];
    } else {
      out[key] = v;
    }
  }
  return out;
}

/** What the user typed, so a rejected form can show it again (never secrets or files). */
export function echoFields(form: FormData): Record<string, string> {
  const out: Record<string, string> = {};
  for (const [key, value] of form.entries()) {
    if (key.startsWith("$ACTION") || SECRET_FIELDS.test(key) || typeof value !== "string") continue;
    out[key] = value.slice(0, 2000);
  }
  return out;
}
