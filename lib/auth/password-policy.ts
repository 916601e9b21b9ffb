import { dictionary } from "@zxcvbn-ts/language-common";
import { z } from "zod";

export const PASSWORD_MIN_LENGTH = 12;
export const PASSWORD_MAX_LENGTH = 200;

// The common-password list that ships with zxcvbn-ts (about 49,000 passwords seen most often in breaches).
let common: Set<string> | null = null;
function commonPasswords(): Set<string> {
  common ??= new Set(dictionary["passwords-common"].map((p) => p.toLowerCase()));
  return common;
}

/** Why a new password is refused, or null when it is fine. */
export function passwordProblem(password: string, email?: string | null): string | null {
  if ([...password].length < PASSWORD_MIN_LENGTH) return `Use at least ${PASSWORD_MIN_LENGTH} characters.`;
  if (password.length > PASSWORD_MAX_LENGTH) return "That password is too long.";
  const lower = password.trim().toLowerCase();
  if (email && (lower === email.trim().toLowerCase() || lower === email.trim().toLowerCase().split("@")[0])) {
    return "Do not use your e-mail address as your password.";
  }
  if (commonPasswords().has(lower)) return "That password is on a list of common passwords; choose another.";
  return null;
}

/** A new password field: length here; the e-mail and common-list checks need the account, see passwordProblem. */
export const newPasswordField = z
  .string()
  .min(PASSWORD_MIN_LENGTH, `Use at least ${PASSWORD_MIN_LENGTH} characters.`)
  .max(PASSWORD_MAX_LENGTH, "That password is too long.");
