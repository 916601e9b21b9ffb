import { money, percent } from "@/lib/format";
import type { RoughQuote } from "./quote";

export interface SummaryMailInput {
  shop: { name: string; email: string; phone: string; openingHours: string };
  reference: string;
  callerName: string;
  familyName: string;
  symptom: string;
  outcome: "advised" | "booked_in";
  likely: { name: string; probability: number }[];
  unlisted: number;
  quote: RoughQuote | null;
  sendInstructions: string;
  advice: string;
  stopRiding: boolean;
}

export interface ComposedMail {
  subject: string;
  text: string;
  html: string;
}

const STANDING_SAFETY =
  "Do not open the drive unit yourself. Keep a battery that has been dropped, wet, swollen or hot away from " +
  "anything that burns, do not charge it, and ask a battery specialist. The motor maker's service documents and " +
  "local rules come first.";

function escapeHtml(value: string): string {
  return value.replace(/[&<>"']/g, (ch) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" })[ch] ?? ch);
}


/** The summary a caller gets after the call, as plain text and simple HTML with the same content. */
export function composeSummaryMail(m: SummaryMailInput): ComposedMail {
  const sections: { heading: string; lines: string[] }[] = [];
  if (m.stopRiding) {
    sections.push({ heading: "Please stop riding", lines: [
      "What you described points at a drive that can slip or jam under load. Please do not ride the bike until it has been repaired: a drive that lets go can throw the rider.",
    ] });
  }
  sections.push({
    heading: m.outcome === "booked_in" ? "What we think is wrong" : "What we talked about",
    lines: [
      ...m.likely.map((c) => `${c.name}: about ${percent(c.probability)} likely`),
      ...(m.unlisted >= 0.2 ? [`There is a ${percent(m.unlisted)} chance it is something none of these covers; the bench will tell.`] : []),
      "These are estimates from the phone call; the unit on the bench decides.",
    ],
  });
  if (m.outcome === "booked_in") {
    if (m.quote) {
      sections.push({ heading: "Rough quote", lines: [
        `${money(m.quote.lowCents)} to ${money(m.quote.highCents)}, about ${Math.round(m.quote.labourMinutes / 5) * 5} minutes of labour, if the likely causes above are confirmed.`,
        "We call you with a firm price before any work beyond the inspection.",
      ] });
    }
    sections.push({ heading: "How to send the unit", lines: [m.sendInstructions, `Please put a note with ${m.reference} and your phone number inside.`] });
  }
  if (m.advice) sections.push({ heading: m.outcome === "advised" ? "Our advice" : "Notes", lines: [m.advice] });
  sections.push({ heading: "Safety", lines: [STANDING_SAFETY] });

  const subject = m.outcome === "booked_in"
    ? `${m.reference}: your ${m.familyName} drive unit is booked in`
    : `${m.reference}: summary of your call about the ${m.familyName} drive unit`;
  const greeting = `Hello ${m.callerName},`;
  const intro = `thank you for calling ${m.shop.name} about "${m.symptom}". Here is a summary of the call (case ${m.reference}).`;
  const contact = `${m.shop.name} · ${m.shop.email}${m.shop.phone ? ` · ${m.shop.phone}` : ""}${m.shop.openingHours ? ` · ${m.shop.openingHours}` : ""}`;

  const text = [
    greeting, "", intro, "",
    ...sections.flatMap((s) => [s.heading.toUpperCase(), ...s.lines.map((l) => `- ${l}`), ""]),
    contact, "",
  ].join("\n");
  const html = [
    `<!doctype html><html><body style="font-family:sans-serif;line-height:1.45;color:#1c2430">`,
    `<p>${escapeHtml(greeting)}</p><p>${escapeHtml(intro)}</p>`,
    ...sections.map((s) => `<h3>${escapeHtml(s.heading)}</h3><ul>${s.lines.map((l) => `<li>${escapeHtml(l)}</li>`).join("")}</ul>`),
    `<p style="color:#4a5463">${escapeHtml(contact)}</p></body></html>`,
  ].join("\n");
  return { subject, text, html };
}
