import type { Metadata } from "next";
import Link from "next/link";
import { CauseForm } from "@/components/catalogue/cause-form";
import { Panel } from "@/components/ui/panel";
import { requireRole } from "@/lib/auth/require-role";
import { listParts } from "@/lib/catalogue/queries";

export const metadata: Metadata = { title: "New cause" };

export default async function NewCausePage() {
  await requireRole("catalogue:edit", "/catalogue/causes/new");
  const parts = await listParts();
  return (
    <div className="flex flex-col gap-4">
      <p className="text-sm"><Link href="/catalogue">Catalogue</Link></p>
      <h1>New cause</h1>
      <Panel><CauseForm cause={null} parts={parts} /></Panel>
    </div>
  );
}
