import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { MessageView } from "@/components/outbox/message-view";
import { Panel } from "@/components/ui/panel";
import { requireRole } from "@/lib/auth/require-role";
import { outboxMessage } from "@/lib/mail/outbox";

export const metadata: Metadata = { title: "Message" };

export default async function OutboxMessagePage({ params }: { params: Promise<{ id: string }> }) {
  const { id: raw } = await params;
  await requireRole("outbox:read", `/outbox/${raw}`);
  const id = Number(raw);
  if (!Number.isInteger(id) || id <= 0) notFound();
  const message = await outboxMessage(id);
  if (!message) notFound();
  return (
    <div className="flex flex-col gap-4">
      <p><Link href="/outbox">← Outbox</Link></p>
      <h1>Message {message.id}</h1>
      <Panel><MessageView message={message} /></Panel>
    </div>
  );
}
