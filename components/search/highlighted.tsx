import { highlightSegments } from "@/lib/search/highlight";

export function Highlighted({ text, terms }: { text: string; terms: string[] }) {
  return (
    <>
      {highlightSegments(text, terms).map((s, i) =>
        s.hit ? <mark key={i} className="rounded-sm bg-amber-light px-0.5 text-ink">{s.text}</mark> : <span key={i}>{s.text}</span>,
      )}
    </>
  );
}
