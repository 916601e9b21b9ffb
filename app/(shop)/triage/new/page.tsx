import type { Metadata } from "next";
import { NewCaseForm } from "@/components/triage/new-case-form";
import { requireRole } from "@/lib/auth/require-role";
import { familyChoices, treeChoices } from "@/lib/cases/queries";

export const metadata: Metadata = { title: "New call" };

export default async function NewCallPage() {
  await requireRole("case:work", "/triage/new");
  const [families, trees] = await Promise.all([familyChoices(), treeChoices()]);
  return (
    <div className="touch-targets flex flex-col gap-6">
      <div>
        <h1>New call</h1>
        <p className="text-ink-soft">Who is calling, about which unit, and what they notice. The symptom picks the tree you walk with them.</p>
      </div>
      <NewCaseForm families={families} trees={trees} />
    </div>
  );
}
