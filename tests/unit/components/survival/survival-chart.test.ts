import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { SurvivalChart } from "@/components/survival/survival-chart";

const curve = {
  key: "fitted", name: "Fitted (n = 4)",
  points: [
    { t: 0, s: 1, band: [1, 1] as [number, number] },
    { t: 3, s: 0.75, band: [0.2, 0.96] as [number, number] },
    { t: 6, s: 0.75, band: [0.2, 0.96] as [number, number] },
  ],
};

describe("SurvivalChart", () => {
  const html = renderToStaticMarkup(createElement(SurvivalChart, { curves: [curve], months: 12, label: "Return-free share" }));

  it("draws the curve as steps: flat until the event, then straight down", () => {
    // Plot 496 × 220 inside the margins: 3 of 12 months is x = 124; 75 % is y = 55.
    const line = /<path class="visx-linepath" d="([^"]*)"/.exec(html)?.[1];
    expect(line).toBe("M0,0L124,0L124,55L248,55L248,55");
  });

  it("names each curve on hover", () => {
    expect([...html.matchAll(/<title>([^<]*)<\/title>/g)].map((m) => m[1])).toEqual(["Fitted (n = 4)"]);
  });

  it("marks the months up to the follow-up asked for", () => {
    for (const m of [0, 3, 6, 9, 12]) expect(html).toContain(`>${m} mo<`);
    expect(html).not.toContain(">18 mo<");
  });
});
