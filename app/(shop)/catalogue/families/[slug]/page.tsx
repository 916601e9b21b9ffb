import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { AssemblyForm } from "@/components/catalogue/assembly-form";
import { LocationForm } from "@/components/catalogue/location-form";
import { Panel } from "@/components/ui/panel";
import { requireRole } from "@/lib/auth/require-role";
import { may } from "@/lib/auth/roles";
import { STAGE_CAUTION } from "@/lib/bench/cautions";
import { loadFamilyBench } from "@/lib/bench/queries";
import { listFamilies } from "@/lib/catalogue/queries";
import { deleteAssembly, saveAssembly, saveLocation } from "./actions";

export const metadata: Metadata = { title: "Motor family stages" };

function depthOf(slug: string, parentOf: ReadonlyMap<string, string | null>): number {
  let depth = 0;
  for (let p = parentOf.get(slug); p; p = parentOf.get(p)) depth++;
  return depth;
}

export default async function FamilyStagesPage({ params }: { params: Promise<{ slug: string }> }) {
  const { slug } = await params;
  const user = await requireRole("catalogue:read", `/catalogue/families/${slug}`);
  const family = (await listFamilies()).find((f) => f.slug === slug);
  if (!family) notFound();
  const canEdit = may(user.role, "catalogue:edit");
  const { described: stages, bench } = await loadFamilyBench(family.id);
  const located = bench.causesAfter(null).sort((a, b) => a.name.localeCompare(b.name));
  const parentOf = new Map(stages.map((s) => [s.slug, s.parent]));
  const stageName = new Map(stages.map((s) => [s.slug, s.name]));

  return (
    <div className="flex flex-col gap-6" data-testid="family-stages">
      <p className="text-sm"><Link href="/catalogue">Catalogue</Link></p>
      <div>
        <h1>{family.name} {family.generation}: how the unit comes apart</h1>
        <p className="text-ink-soft">The stages opened at the bench, outermost first, with the minutes to open and close each; the bench checklist pays each opening once.</p>
      </div>
      <Panel title={`Stages (${stages.length})`}>
        <ol className="flex flex-col gap-4">
          {stages.map((s) => (
            <li key={s.slug} style={{ marginLeft: `${depthOf(s.slug, parentOf) * 1.25}rem` }} className="border-l-2 border-ink-faint/30 pl-3" data-testid="stage" data-stage={s.slug}>
              {canEdit ? <AssemblyForm family={family.slug} stage={s} stages={stages} save={saveAssembly} remove={s.parent === null ? undefined : deleteAssembly} /> : (
                <p className="text-sm"><span className="font-medium">{s.name}</span> · open {s.openMinutes} min, close {s.closeMinutes} min
                  {s.caution !== "none" ? <span className="ml-2 rounded bg-amber-light px-1.5 text-xs">{STAGE_CAUTION[s.caution].title}</span> : null}</p>
              )}
            </li>
          ))}
        </ol>
        {canEdit ? (
          <div className="mt-6 border-t border-ink-faint/30 pt-4">
            <h3 className="mb-2 font-semibold">Add a stage</h3>
            <AssemblyForm family={family.slug} stages={stages} save={saveAssembly} />
          </div>
        ) : null}
      </Panel>
      {stages.length > 0 ? (
        <Panel title={`Where each cause is inspected (${located.length})`}>
          {canEdit ? located.map((c) => (
            <LocationForm key={c.slug} family={family.slug} cause={c.slug} name={c.name} stage={c.stage} inspectMinutes={c.inspectMinutes} stages={stages} save={saveLocation} />
          )) : (
            <ul className="text-sm">{located.map((c) => <li key={c.slug}>{c.name}: {stageName.get(c.stage)} · {c.inspectMinutes} min</li>)}</ul>
          )}
        </Panel>
      ) : null}
    </div>
  );
}
