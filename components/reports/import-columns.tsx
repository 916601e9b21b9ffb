import { IMPORT_COLUMNS } from "@/lib/csv/columns";
import { ScrollRegion } from "@/components/ui/scroll-region";

/** The documented column set, with an example line that can be pasted into a spreadsheet. */
export function ImportColumns() {
  const example = [IMPORT_COLUMNS.map((c) => c.name).join(","), IMPORT_COLUMNS.map((c) => (c.example.includes(",") ? `"${c.example}"` : c.example)).join(",")].join("\n");
  return (
    <div className="flex flex-col gap-3">
      <ScrollRegion label="Columns of the import file" className="overflow-x-auto">
        <table className="w-full text-left text-sm" data-testid="import-columns">
          <caption className="sr-only">Columns of a past-repairs file</caption>
          <thead className="border-b border-ink-faint/40 text-xs uppercase tracking-wide text-ink-faint">
            <tr><th scope="col" className="py-1.5 pr-3">Column</th><th scope="col" className="py-1.5 pr-3">Needed</th><th scope="col" className="py-1.5 pr-3">What goes in it</th><th scope="col" className="py-1.5">Example</th></tr>
          </thead>
          <tbody>
            {IMPORT_COLUMNS.map((c) => (
              <tr key={c.name} className="border-b border-ink-faint/15 align-top">
                <td className="py-1.5 pr-3 font-mono text-xs">{c.name}</td>
                <td className="py-1.5 pr-3">{c.required ? "yes" : "no"}</td>
                <td className="py-1.5 pr-3">{c.what}</td>
                <td className="py-1.5 font-mono text-xs">{c.example}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </ScrollRegion>
      <p className="text-sm text-ink-soft">
        Headers may be written in any case, with spaces instead of underscores (“Labour minutes”); other columns are ignored. Commas or
        semicolons both work as separators. Each row becomes a closed case with its confirmed cause and parts; it has no phone triage,
        so tree-accuracy figures leave it out, but cause, parts and repeat-return reports count it.
      </p>
      <ScrollRegion label="Example file" className="overflow-x-auto rounded-md bg-paper-deep">
        <pre className="p-3 font-mono text-xs">{example}</pre>
      </ScrollRegion>
    </div>
  );
}
