import type { ActionState } from "@/lib/actions/define";

/** The outcome line under a form, announced to screen readers. */
export function FormMessage<R>({ state }: { state: ActionState<R> }) {
  return (
    <p aria-live="polite" role="status" className={`min-h-5 text-sm ${state && !state.ok ? "text-danger" : "text-moss"}`}>
      {state ? (state.ok ? (state.message ?? "Saved.") : state.error) : ""}
    </p>
  );
}
