"use client";
import { useActionState } from "react";
import { retryMail } from "@/app/(shop)/outbox/actions";
import type { ActionState } from "@/lib/actions/define";

/** "Retry now" for a message that failed or is waiting out its backoff. */
export function RetryButton({ messageId }: { messageId: number }) {
  const [state, action, pending] = useActionState<ActionState<{ id: number }>, FormData>(retryMail, null);
  return (
    <form action={action} className="inline-flex items-center gap-2">
      <input type="hidden" name="messageId" value={messageId} />
      <button type="submit" disabled={pending} className="rounded-md border border-copper px-2 py-1 text-xs font-medium text-copper-dark hover:bg-copper-light disabled:opacity-50">
        {pending ? "Queuing…" : "Retry now"}
      </button>
      <span aria-live="polite" className={`text-xs ${state && !state.ok ? "text-danger" : "text-moss"}`}>{state ? (state.ok ? "queued" : state.error) : ""}</span>
    </form>
  );
}
