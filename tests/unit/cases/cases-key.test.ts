import { describe, expect, it } from "vitest";
import { casesKey, queryFromParams } from "@/lib/cases/cases-key";
import { caseListQuery } from "@/lib/cases/list-query";
import { parseDiagnosisSettings } from "@/lib/triage/dx-settings";

describe("case list keys and query", () => {
  it("leave defaults out, so the server's parsed query and the URL give the same SWR key", () => {
    const parsed = caseListQuery.parse({ status: "open", family: "3" });
    const fromUrl = queryFromParams(new URLSearchParams("status=open&family=3"));
    expect(casesKey(parsed)).toBe("/api/cases?status=open&family=3");
    expect(casesKey(fromUrl)).toBe(casesKey(parsed));
    expect(casesKey(caseListQuery.parse({}))).toBe("/api/cases");
  });

  it("refuse more than 100 rows a page and an end date before the start", () => {
    expect(caseListQuery.safeParse({ limit: "101" }).success).toBe(false);
    expect(caseListQuery.safeParse({ from: "2026-03-02", to: "2026-03-01" }).success).toBe(false);
    expect(caseListQuery.safeParse({ sort: "password" }).success).toBe(false);
  });
});

describe("diagnosis settings from the settings table", () => {
  it("keep valid values and drop an invalid document entirely, so the engine's defaults apply", () => {
    expect(parseDiagnosisSettings({ priorStrength: 4, stopThreshold: 0.9 })).toEqual({ priorStrength: 4, stopThreshold: 0.9 });
    expect(parseDiagnosisSettings({ unlistedShare: 1.5 })).toEqual({});
    expect(parseDiagnosisSettings(null)).toEqual({});
  });
});
