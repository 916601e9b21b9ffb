import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { ParetoChart, type ParetoPoint } from "@/components/reports/pareto-chart";
import { PartsChart } from "@/components/reports/parts-chart";
import { TrendChart } from "@/components/reports/trend-chart";
import { CalibrationChart } from "@/components/reports/calibration-chart";
import { pct } from "@/lib/format";

const svgOf = (html: string) => new ChartMarkup(html);

/** Just enough of the markup to check the marks: each rect's numbers and each title's text. */
class ChartMarkup {
  constructor(private readonly html: string) {}
  rects() {
    return [...this.html.matchAll(/<rect([^>]*)>/g)].map((m) => {
      const attr = (name: string) => Number(new RegExp(`\\s${name}="([^"]*)"`).exec(m[1])?.[1]);
      return { x: attr("x"), y: attr("y"), width: attr("width"), height: attr("height") };
    });
  }
  titles() { return [...this.html.matchAll(/<title>([^<]*)<\/title>/g)].map((m) => m[1].replace(/&amp;/g, "&")); }
  count(tag: string) { return this.html.split(`<${tag}`).length - 1; }
  get markup() { return this.html; }
}

describe("ParetoChart", () => {
  const points: ParetoPoint[] = [
    { rank: 1, name: "Worn one-way clutch", n: 50, share: 50, error: [9, 9], cumulative: 50 },
    { rank: 2, name: "Water in the torque sensor", n: 25, share: 25, error: [7, 8], cumulative: 75 },
  ];
  const chart = svgOf(renderToStaticMarkup(createElement(ParetoChart, { points })));

  it("draws one bar per cause, heights in proportion to the shares (to the whole unit the chart rounds to)", () => {
    const [first, second] = chart.rects();
    expect(chart.rects()).toHaveLength(2);
    expect(Math.abs(first.height - 2 * second.height)).toBeLessThanOrEqual(1);
    expect(first.y + first.height).toBeCloseTo(second.y + second.height, 6);
  });

  it("writes each tick label as one text, the causes' names tilted about their own tick", () => {
    expect(chart.count("svg")).toBe(1);
    expect(chart.count("tspan")).toBe(0);
    const tilted = [...chart.markup.matchAll(/<text x="([\d.-]+)" y="([\d.-]+)"[^>]*transform="rotate\(-?\d+, ([\d.-]+), ([\d.-]+)\)"[^>]*>([^<]*)</g)];
    expect(tilted.map((m) => m[5])).toEqual(["Worn one-way clutch", "Water in the torque s…"]);
    for (const [, x, y, cx, cy] of tilted) expect([cx, cy]).toEqual([x, y]);
  });

  it("draws each 95 % interval as a whisker through the top of its bar", () => {
    const whiskers = [...chart.markup.matchAll(/class="whisker" d="M([\d.-]+),([\d.-]+)V([\d.-]+)/g)].map((m) => ({ x: Number(m[1]), low: Number(m[2]), high: Number(m[3]) }));
    expect(whiskers).toHaveLength(2);
    chart.rects().forEach((bar, i) => {
      expect(whiskers[i].x).toBeCloseTo(bar.x + bar.width / 2, 6);
      expect(whiskers[i].low).toBeGreaterThan(bar.y);
      expect(whiskers[i].high).toBeLessThan(bar.y);
    });
    // 50 % ± 9: as far above the bar's top as below it, to the unit the chart rounds to.
    expect(Math.abs((whiskers[0].low - chart.rects()[0].y) - (chart.rects()[0].y - whiskers[0].high))).toBeLessThanOrEqual(1);
  });

  it("names each cause with its share, count and interval on hover", () => {
    expect(chart.titles()).toEqual([
      `Worn one-way clutch: ${pct(0.5)} of cases (n = 50), 95 % interval ${pct(0.41)}–${pct(0.59)}; cumulative ${pct(0.5)}`,
      `Water in the torque sensor: ${pct(0.25)} of cases (n = 25), 95 % interval ${pct(0.18)}–${pct(0.33)}; cumulative ${pct(0.75)}`,
    ]);
  });

  it("is an image labelled for screen readers, with a legend", () => {
    expect(chart.markup).toContain('role="img"');
    expect(chart.markup).toContain('aria-label="Pareto chart of confirmed causes; the table lists the same numbers"');
    expect(chart.markup).toContain("Cumulative share");
  });
});

describe("PartsChart", () => {
  const parts = [{ slug: "clutch", name: "Clutch" }, { slug: "seal", name: "Seal kit" }];
  const months = [{ label: "Jan 2026", clutch: 3, seal: 1 }, { label: "Feb 2026", clutch: 0, seal: 2 }];
  const chart = svgOf(renderToStaticMarkup(createElement(PartsChart, { months, parts })));

  it("stacks each month's parts without gaps and leaves out parts not used that month", () => {
    const rects = chart.rects();
    expect(rects).toHaveLength(3);
    const [janClutch, janSeal, febSeal] = rects;
    expect(janSeal.y + janSeal.height).toBeCloseTo(janClutch.y, 6);
    expect(janClutch.height / janSeal.height).toBeCloseTo(3, 6);
    expect(febSeal.height / janSeal.height).toBeCloseTo(2, 6);
    expect(chart.titles()).toEqual(["Jan 2026, Clutch: 3", "Jan 2026, Seal kit: 1", "Feb 2026, Seal kit: 2"]);
  });
});

describe("TrendChart", () => {
  const months = Array.from({ length: 24 }, (_, i) => ({ label: `M${i + 1}`, clutch: i % 3 }));
  const chart = svgOf(renderToStaticMarkup(createElement(TrendChart, { months, series: [{ key: "clutch", name: "Clutch wear" }] })));

  it("draws one line per cause and a hover column per month naming each cause's count", () => {
    expect(chart.count("path")).toBeGreaterThanOrEqual(1);
    expect(chart.titles()).toHaveLength(24);
    expect(chart.titles()[4]).toBe("M5: Clutch wear 1");
    const columns = chart.rects();
    expect(columns).toHaveLength(24);
    // Side by side with no gap or overlap, each as wide as a month's step.
    for (let i = 1; i < columns.length; i++) expect(columns[i].x).toBeCloseTo(columns[i - 1].x + columns[i - 1].width, 6);
  });

  it("names every cause of a month in its hover text", () => {
    const two = svgOf(renderToStaticMarkup(createElement(TrendChart, {
      months: [{ label: "Jan 2026", clutch: 3, seal: 1 }, { label: "Feb 2026", clutch: 0, seal: 2 }],
      series: [{ key: "clutch", name: "Clutch wear" }, { key: "seal", name: "Seal hardened" }],
    })));
    expect(two.titles()).toEqual(["Jan 2026: Clutch wear 3, Seal hardened 1", "Feb 2026: Clutch wear 0, Seal hardened 2"]);
    expect(two.count("path")).toBe(2);
  });

  it("labels every second month when 24 do not fit", () => {
    expect(chart.markup).toContain(">M1<");
    expect(chart.markup).toContain(">M3<");
    expect(chart.markup).not.toContain(">M2<");
  });
});

describe("CalibrationChart", () => {
  const chart = svgOf(renderToStaticMarkup(createElement(CalibrationChart, {
    points: [{ bin: "0–50 %", n: 10, predicted: 30, observed: 20 }, { bin: "50–100 %", n: 30, predicted: 80, observed: 80 }],
  })));

  it("draws the confirmed share as bars on a 0–100 % axis", () => {
    const [low, high] = chart.rects();
    expect(high.height / low.height).toBeCloseTo(4, 6);
    expect(chart.titles()[1]).toBe(`Top probability 50–100 % (n = 30): confirmed ${pct(0.8)}, the tree gave ${pct(0.8)}`);
  });
});
