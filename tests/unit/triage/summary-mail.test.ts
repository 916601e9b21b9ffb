import { describe, expect, it } from "vitest";
import { composeSummaryMail, type SummaryMailInput } from "@/lib/triage/summary-mail";

const base: SummaryMailInput = {
  shop: { name: "Test Workshop", email: "bench@workshop.example.test", phone: "", openingHours: "" },
  reference: "TW-2601-0001", callerName: "Ada <script>", familyName: "Family X", symptom: "Clicks",
  outcome: "booked_in", likely: [{ name: "Cause A", probability: 0.62 }], unlisted: 0.05,
  quote: { lowCents: 16500, highCents: 27000, labourMinutes: 80, basis: [] },
  sendInstructions: "Send the unit.", advice: "", stopRiding: true,
};

describe("the summary e-mail", () => {
  it("has the likely cause, the quote, how to send, the stop-riding and standing safety advice in text and HTML", () => {
    const m = composeSummaryMail(base);
    expect(m.subject).toBe("TW-2601-0001: your Family X drive unit is booked in");
    for (const part of ["PLEASE STOP RIDING", "Cause A: about 62\u00a0% likely", "€165 to €270", "HOW TO SEND THE UNIT", "Do not open the drive unit yourself"]) {
      expect(m.text).toContain(part);
    }
    expect(m.html).toContain("<h3>Rough quote</h3>");
  });

  it("escapes what callers typed in the HTML version", () => {
    const m = composeSummaryMail(base);
    expect(m.html).toContain("Hello Ada &lt;script&gt;,");
    expect(m.html).not.toContain("<script>");
  });

  it("an advised call has no quote and no shipping, but keeps the advice", () => {
    const m = composeSummaryMail({ ...base, outcome: "advised", quote: null, stopRiding: false, advice: "Update the display firmware." });
    expect(m.text).not.toMatch(/ROUGH QUOTE|HOW TO SEND|STOP RIDING/);
    expect(m.text).toContain("OUR ADVICE\n- Update the display firmware.");
  });

  it("carries upgrade advice the shop's record supports, and no such section without it", () => {
    const line = "Of the Family X units we repaired, those fitted with the uprated clutch came back with a clutch fault less often.";
    const m = composeSummaryMail({ ...base, upgradeAdvice: [line] });
    expect(m.text).toContain("UPGRADES THAT HAVE HELPED UNITS LIKE YOURS");
    expect(m.text).toContain(`- ${line}`);
    expect(m.html).toContain("<h3>Upgrades that have helped units like yours</h3>");
    expect(composeSummaryMail(base).text).not.toContain("UPGRADES THAT HAVE HELPED");
    expect(composeSummaryMail({ ...base, outcome: "advised", quote: null, upgradeAdvice: [line] }).text).not.toContain("UPGRADES THAT HAVE HELPED");
  });
});
