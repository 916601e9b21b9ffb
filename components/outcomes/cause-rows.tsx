"use client";
import { FieldError } from "./field-error";
import type { CauseChoice } from "./types";

export interface CauseRow {
  key: number;
  causeId: string;
}

const AREA_LABELS: Record<string, string> = {
  clutch: "Clutches", bearing: "Bearings", seal: "Seals", drive_train: "Gears and drive train", sensor: "Sensors",
  electronics: "Electronics", cable: "Cables and connectors", firmware: "Firmware and settings", housing: "Housing and mounting", other: "Other",
};

/** Confirmed causes as rows of a catalogue select, each with its "primary" radio. */
export function CauseRows({ rows, setRows, primary, setPrimary, catalogue, ranked, errors }: {
  rows: CauseRow[];
  setRows: (rows: CauseRow[]) => void;
  primary: string;
  setPrimary: (value: string) => void;
  catalogue: CauseChoice[];
  ranked: number[];
  errors: Record<string, string>;
}) {
  const byId = new Map(catalogue.map((c) => [c.id, c]));
  const areas = [...new Set(catalogue.map((c) => c.area))];
  const rankedChoices = ranked.map((id) => byId.get(id)).filter((c): c is CauseChoice => !!c);
  let nextKey = Math.max(0, ...rows.map((r) => r.key)) + 1;

  return (
    <div className="flex flex-col gap-2">
      {rows.map((row, i) => {
        const errorId = `cause-${row.key}-error`;
        return (
          <div key={row.key} className="flex flex-col gap-1">
            <div className="flex flex-wrap items-center gap-2">
              <label className="sr-only" htmlFor={`cause-${row.key}`}>Confirmed cause {i + 1}</label>
              <select
                id={`cause-${row.key}`}
                name="causeId"
                value={row.causeId}
                aria-invalid={errors[`causeId.${i}`] ? true : undefined}
                aria-describedby={errors[`causeId.${i}`] ? errorId : undefined}
                onChange={(e) => {
                  const was = row.causeId;
                  setRows(rows.map((r) => (r.key === row.key ? { ...r, causeId: e.target.value } : r)));
                  if (primary === was || (primary === "" && rows.length === 1)) setPrimary(e.target.value);
                }}
                className={`min-w-0 flex-1 rounded-md border bg-white px-3 py-2 ${errors[`causeId.${i}`] ? "border-danger" : "border-ink-faint/50"}`}
              >
                <option value="">Pick a cause…</option>
                {rankedChoices.length ? (
                  <optgroup label="Ranked highest at triage">
                    {rankedChoices.map((c) => <option key={`r${c.id}`} value={c.id}>{c.name}</option>)}
                  </optgroup>
                ) : null}
                {areas.map((area) => (
                  <optgroup key={area} label={AREA_LABELS[area] ?? area}>
                    {catalogue.filter((c) => c.area === area).map((c) => <option key={c.id} value={c.id}>{c.name}</option>)}
                  </optgroup>
                ))}
              </select>
              <label className="flex items-center gap-1 text-sm text-ink-soft">
                <input
                  type="radio"
                  name="primaryCause"
                  value={row.causeId}
                  disabled={row.causeId === ""}
                  checked={row.causeId !== "" && primary === row.causeId}
                  onChange={() => setPrimary(row.causeId)}
                />
                Primary
              </label>
              <button
                type="button"
                className="rounded-md px-2 py-1 text-sm text-ink-soft hover:bg-paper-deep"
                onClick={() => {
                  setRows(rows.filter((r) => r.key !== row.key));
                  if (primary === row.causeId) setPrimary("");
                }}
              >
                Remove<span className="sr-only"> cause {i + 1}</span>
              </button>
            </div>
            <FieldError id={errorId} message={errors[`causeId.${i}`]} />
          </div>
        );
      })}
      <div>
        <button
          type="button"
          className="rounded-md border border-ink-faint/50 px-3 py-1 text-sm hover:bg-paper-deep"
          onClick={() => setRows([...rows, { key: nextKey++, causeId: "" }])}
        >
          Add {rows.length ? "another" : "a"} confirmed cause
        </button>
      </div>
    </div>
  );
}
