// C0 controls and DEL, except tab, line feed and carriage return, which multi-line text may hold.
// PostgreSQL refuses a NUL byte in text outright; the others have no place in anything typed.
const CONTROL = /[\u0000-\u0008\u000B\u000C\u000E-\u001F\u007F]/;

export const CONTROL_CHARACTER_MESSAGE = "This contains a control character (such as a NUL byte); remove it and try again.";

/** The path ("notes", "steps.2.text") of the first string holding a control character, or null. */
export function fieldWithControlCharacter(value: unknown, path = "", depth = 0): string | null {
  if (typeof value === "string") return CONTROL.test(value) ? path || "_form" : null;
  if (depth > 20 || value === null || typeof value !== "object") return null;
  if (typeof Blob !== "undefined" && value instanceof Blob) return null;
  const entries = Array.isArray(value) ? value.map((v, i) => [String(i), v] as const) : Object.entries(value);
  for (const [key, inner] of entries) {
    const keyPath = path ? `${path}.${key}` : key;
    if (CONTROL.test(key)) return keyPath;
    const found = fieldWithControlCharacter(inner, keyPath, depth + 1);
    if (found) return found;
  }
  return null;
}
