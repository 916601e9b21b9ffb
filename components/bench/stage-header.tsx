import { STAGE_CAUTION } from "@/lib/bench/cautions";
import type { StageInfo } from "@/lib/bench/types";

/** The stages the next inspection opens, outermost first, each with its minutes and standing caution. */
export function StageHeader({ stages }: { stages: StageInfo[] }) {
  return (
    <ul className="flex flex-col gap-2">
      {stages.map((s) => (
        <li key={s.slug} data-testid="stage-open" data-stage={s.slug} className="rounded-md border border-ink-faint/30 bg-paper-deep/50 p-3">
          <p className="text-sm font-semibold">Open: {s.name} <span className="font-normal text-ink-soft">· {s.openMinutes} min (close {s.closeMinutes} min)</span></p>
          {s.caution !== "none" ? (
            <p role="note" data-testid="stage-caution" className="mt-2 rounded border-l-4 border-amber bg-amber-light px-3 py-2 text-sm">
              <span className="font-semibold">{STAGE_CAUTION[s.caution].title}.</span> {STAGE_CAUTION[s.caution].text}
            </p>
          ) : null}
        </li>
      ))}
    </ul>
  );
}
