import type { Metadata } from "next";
import { Suspense } from "react";
import { CasesTable } from "@/components/cases/cases-table";
import { requireRole } from "@/lib/auth/require-role";
import { casesKey } from "@/lib/cases/cases-key";
import { listCases } from "@/lib/cases/list";
import { caseListQuery } from "@/lib/cases/list-query";
import { caseFilterChoices } from "@/lib/cases/queries";

export const metadata: Metadata = { title: "Cases" };

export default async function CasesPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  await requireRole("case:read", "/cases");
  const raw = Object.fromEntries(Object.entries(await searchParams).map(([k, v]) => [k, Array.isArray(v) ? v[0] : v]));
  const parsed = caseListQuery.safeParse(raw);
  const query = parsed.success ? parsed.data : caseListQuery.parse({});
  const [first, choices] = await Promise.all([listCases(query), caseFilterChoices()]);
  return (
    <div className="flex flex-col gap-4">
      <div>
        <h1>Cases</h1>
        <p className="text-ink-soft">Every call and what became of it. Filters stay in the address, so a filtered list can be bookmarked or shared.</p>
      </div>
      <Suspense>
        <CasesTable fallback={first} fallbackKey={casesKey(query)} choices={choices} />
      </Suspense>
    </div>
  );
}
