import "server-only";
import type { Tx } from "@/db";
import { enqueueMail } from "@/lib/mail/outbox";
import { ROLE_LABELS, type Role } from "@/lib/auth/roles";
import { appUrl } from "@/lib/http/app-url";

export async function queueInvitation(tx: Tx, to: { email: string; name: string; role: Role }, invitedBy: string, token: string): Promise<void> {
  const link = `${appUrl()}/invite?token=${encodeURIComponent(token)}`;
  await enqueueMail(tx, {
    to: to.email,
    subject: "Your Rootbench account",
    text: [
      `Hello ${to.name},`,
      "",
      `${invitedBy} has invited you to the workshop's Rootbench as ${ROLE_LABELS[to.role]}.`,
      "Choose your password here (the link works once, for 72 hours):",
      "",
      link,
      "",
      "If you did not expect this, ignore this message.",
    ].join("\n"),
  });
}

export async function queueResetLink(tx: Tx, to: { email: string; name: string }, token: string, reason: "requested" | "forced"): Promise<void> {
  const link = `${appUrl()}/reset-password?token=${encodeURIComponent(token)}`;
  await enqueueMail(tx, {
    to: to.email,
    subject: "Set a new Rootbench password",
    text: [
      `Hello ${to.name},`,
      "",
      reason === "forced"
        ? "An administrator has asked you to choose a new password for Rootbench; your old one no longer works."
        : "Someone (hopefully you) asked to reset your Rootbench password.",
      "Choose a new password here (the link works once, for one hour):",
      "",
      link,
      "",
      reason === "forced"
        ? "If the link has expired, ask for a new one on the sign-in page (\"Forgot your password?\")."
        : "If you did not ask for this, ignore this message; your password stays as it is.",
    ].join("\n"),
  });
}
