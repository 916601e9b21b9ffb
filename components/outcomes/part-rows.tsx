"use client";
import { FieldError } from "./field-error";
import type { PartChoice } from "./types";

export interface PartRow {
  key: number;
  partId: string;
  quantity: string;
}

/** Parts replaced as rows of part and quantity; an empty row is ignored on save. */
export function PartRows({ rows, setRows, catalogue, errors }: {
  rows: PartRow[];
  setRows: (rows: PartRow[]) => void;
  catalogue: PartChoice[];
  errors: Record<string, string>;
}) {
  const update = (key: number, patch: Partial<PartRow>) => setRows(rows.map((r) => (r.key === key ? { ...r, ...patch } : r)));
  const nextKey = Math.max(0, ...rows.map((r) => r.key)) + 1;
  return (
    <div className="flex flex-col gap-2">
      {rows.map((row, i) => {
        const partError = errors[`partId.${i}`];
        const qtyError = errors[`partQty.${i}`];
        return (
          <div key={row.key} className="flex flex-col gap-1">
            <div className="flex flex-wrap items-center gap-2">
              <label className="sr-only" htmlFor={`part-${row.key}`}>Part {i + 1}</label>
              <select
                id={`part-${row.key}`}
                name="partId"
                value={row.partId}
                aria-invalid={partError ? true : undefined}
                aria-describedby={partError ? `part-${row.key}-error` : undefined}
                onChange={(e) => update(row.key, { partId: e.target.value })}
                className={`min-w-0 flex-1 rounded-md border bg-white px-3 py-2 ${partError ? "border-danger" : "border-ink-faint/50"}`}
              >
                <option value="">Pick a part…</option>
                {catalogue.map((p) => <option key={p.id} value={p.id}>{p.name} ({p.sku})</option>)}
              </select>
              <label className="sr-only" htmlFor={`qty-${row.key}`}>Quantity of part {i + 1}</label>
              <input
                id={`qty-${row.key}`}
                name="partQty"
                inputMode="numeric"
                value={row.quantity}
                aria-invalid={qtyError ? true : undefined}
                aria-describedby={qtyError ? `qty-${row.key}-error` : undefined}
                onChange={(e) => update(row.key, { quantity: e.target.value })}
                className={`w-20 rounded-md border bg-white px-3 py-2 ${qtyError ? "border-danger" : "border-ink-faint/50"}`}
              />
              <button
                type="button"
                className="rounded-md px-2 py-1 text-sm text-ink-soft hover:bg-paper-deep"
                onClick={() => setRows(rows.filter((r) => r.key !== row.key))}
              >
                Remove<span className="sr-only"> part {i + 1}</span>
              </button>
            </div>
            <FieldError id={`part-${row.key}-error`} message={partError} />
            <FieldError id={`qty-${row.key}-error`} message={qtyError} />
          </div>
        );
      })}
      <div>
        <button
          type="button"
          className="rounded-md border border-ink-faint/50 px-3 py-1 text-sm hover:bg-paper-deep"
          onClick={() => setRows([...rows, { key: nextKey, partId: "", quantity: "1" }])}
        >
          Add a part
        </button>
      </div>
    </div>
  );
}
