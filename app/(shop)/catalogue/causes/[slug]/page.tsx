import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { CauseForm } from "@/components/catalogue/cause-form";
import { Panel } from "@/components/ui/panel";
import { requireRole } from "@/lib/auth/require-role";
import { causeBySlug, listParts } from "@/lib/catalogue/queries";

export const metadata: Metadata = { title: "Edit cause" };

export default async function EditCausePage({ params }: { params: Promise<{ slug: string }> }) {
  const { slug } = await params;
  await requireRole("catalogue:edit", `/catalogue/causes/${slug}`);
  const [cause, parts] = await Promise.all([/^[a-z0-9-]{1,80}$/.test(slug) ? causeBySlug(slug) : null, listParts()]);
  if (!cause) notFound();
  return (
    <div className="flex flex-col gap-4">
      <p className="text-sm"><Link href="/catalogue">Catalogue</Link></p>
      <h1>Edit “{cause.name}”</h1>
      <Panel><CauseForm cause={cause} parts={parts} /></Panel>
    </div>
  );
}
