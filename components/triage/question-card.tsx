import { OPENING_CAUTION } from "@/lib/trees/caution";
import type { ViewNode, ViewOption } from "@/lib/triage/walk-view";

const KIND_LABEL = { question: "Ask the caller", check: "Hands-on check" } as const;

/** The question in large type with one big button per answer; the number on each is its key. */
export function QuestionCard({ node, options, disabled, jumped, onAnswer, onSkip }: {
  node: ViewNode;
  options: ViewOption[];
  disabled: boolean;
  jumped: boolean;
  onAnswer: (option: ViewOption) => void;
  onSkip: (() => void) | null;
}) {
  const kind = node.kind === "check" ? "check" : "question";
  return (
    <section aria-labelledby="current-question" data-testid="current-question" data-node={node.key}
      className="rounded-xl border-2 border-ink/80 bg-white p-6 shadow-sm">
      <p className="text-sm font-medium uppercase tracking-wide text-copper-dark">
        {KIND_LABEL[kind]}
        {node.kind === "check" ? <span className="ml-2 normal-case text-ink-soft">about {node.costMinutes} min{node.needsOpening ? ", unit opened" : ""}</span> : null}
        {jumped ? <span className="ml-2 rounded bg-copper-light px-2 py-0.5 normal-case text-copper-dark">picked from the suggestions</span> : null}
      </p>
      <h2 id="current-question" className="mt-2 text-3xl font-semibold leading-tight">{node.title}</h2>
      <p className="mt-2 text-xl leading-relaxed text-ink-soft">{node.prompt}</p>
      {node.needsOpening ? (
        <p role="note" className="mt-4 rounded-md border-l-4 border-amber bg-amber-light p-3 text-sm text-ink">
          <strong>Opening the unit. </strong>{OPENING_CAUTION}
        </p>
      ) : null}
      <div className="mt-6 grid gap-3 sm:grid-cols-2">
        {options.map((option, i) => (
          <button key={option.key} type="button" disabled={disabled} onClick={() => onAnswer(option)}
            data-testid="answer-option" data-option={option.key}
            className={`flex min-h-16 items-center gap-3 rounded-lg border-2 px-4 py-3 text-left text-lg font-medium
              disabled:opacity-60 ${option.dontKnow ? "border-dashed border-ink-faint bg-paper text-ink-soft hover:border-ink-soft" : "border-copper/60 bg-white hover:border-copper hover:bg-copper-light/40"}`}>
            <kbd className="flex h-8 w-8 shrink-0 items-center justify-center rounded-md bg-ink font-mono text-base text-paper">{i < 9 ? i + 1 : "·"}</kbd>
            <span>{option.label}</span>
          </button>
        ))}
        {onSkip ? (
          <button type="button" disabled={disabled} onClick={onSkip} data-testid="skip-question"
            className="flex min-h-16 items-center gap-3 rounded-lg border-2 border-dashed border-ink-faint bg-paper px-4 py-3 text-left text-lg text-ink-soft hover:border-ink-soft disabled:opacity-60">
            <kbd className="flex h-8 w-8 shrink-0 items-center justify-center rounded-md bg-ink-soft font-mono text-base text-paper">S</kbd>
            <span>
              Don&apos;t know — skip for now
              <span className="block text-sm">This question has no &ldquo;don&apos;t know&rdquo; answer, so skipping records nothing; it stays open for later.</span>
            </span>
          </button>
        ) : null}
      </div>
    </section>
  );
}
