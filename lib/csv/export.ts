import "server-only";
import Papa from "papaparse";
import { sql as pg } from "@/db";
import { inScope, type ReportScope } from "@/lib/reports/scope";
import { BOM } from "./lines";
import { logFailure } from "@/lib/log/failure";

/** The import's columns first (a file exported here can be edited and imported elsewhere), then the rest. */
export const EXPORT_COLUMNS = [
  "date", "reference", "family", "serial", "riding_use", "caller_kind", "symptom", "cause", "parts", "labour_minutes", "notes",
  "opened", "tree", "tree_version", "other_causes", "cause_not_in_catalogue", "upgrades", "repeat_of", "triaged_on_tree",
] as const;

type ExportRow = Record<(typeof EXPORT_COLUMNS)[number], string | number> & { id: number };

const BATCH = 500;

/**
 * Text a spreadsheet would run as a formula gets an apostrophe in front (OWASP, "CSV Injection"):
 * at the start of the cell, and also after every character a spreadsheet may take as a field
 * separator (comma, semicolon, tab) or a line break, optionally past spaces and a quote, because
 * a file opened with another separator than ours splits the cell there and each piece becomes a
 * cell of its own. Done here rather than with papaparse's escapeFormulae, which looks at the start only.
 */
export function neutraliseFormula(cell: string): string {
  return cell.replace(/(^|[,;\t\r\n])([ "]*)(?=[=+\-@\t\r])/g, "$1$2'");
}

/** One batch of closed cases in scope after `afterId`, everything aggregated per case in Postgres. */
async function batchAfter(scope: ReportScope, afterId: number): Promise<ExportRow[]> {
  return pg<ExportRow[]>`
    select c.id,
      to_char(c.closed_at at time zone 'UTC', 'YYYY-MM-DD') as date, c.reference, f.slug as family, c.serial,
      c.riding_use, c.caller_kind, c.symptom,
      coalesce((select ca.slug from outcome_causes oc join causes ca on ca.id = oc.cause_id
                where oc.case_id = c.id and oc.is_primary limit 1), '') as cause,
      coalesce((select string_agg(p.slug || ':' || op.quantity, ';' order by p.slug)
                from outcome_parts op join parts p on p.id = op.part_id where op.case_id = c.id), '') as parts,
      coalesce(o.labour_minutes, 0) as labour_minutes, coalesce(o.notes, '') as notes,
      to_char(c.created_at at time zone 'UTC', 'YYYY-MM-DD') as opened, t.slug as tree, v.number as tree_version,
      coalesce((select string_agg(ca.slug, ';' order by ca.slug) from outcome_causes oc join causes ca on ca.id = oc.cause_id
                where oc.case_id = c.id and not oc.is_primary), '') as other_causes,
      coalesce(o.other_cause, '') as cause_not_in_catalogue, coalesce(o.upgrades, '') as upgrades,
      coalesce(r.reference, '') as repeat_of,
      case when exists (select 1 from case_steps s where s.case_id = c.id) then 'yes' else 'no' end as triaged_on_tree
    from cases c
    join motor_families f on f.id = c.family_id
    join tree_versions v on v.id = c.tree_version_id
    join trees t on t.id = v.tree_id
    left join case_outcomes o on o.case_id = c.id
    left join cases r on r.id = c.repeat_of_case_id
    where ${inScope(scope)} and c.id > ${afterId}
    order by c.id
    limit ${BATCH}`;
}

/**
 * The closed cases in scope with their outcomes as CSV: UTF-8 with a byte-order mark (so
 * spreadsheets read accents right), RFC 4180 quoting by papaparse, and cells that a spreadsheet
 * would run as a formula neutralised (see neutraliseFormula). Streamed in batches.
 */
export function casesCsvStream(scope: ReportScope): ReadableStream<Uint8Array> {
  const encoder = new TextEncoder();
  let afterId = 0;
  let started = false;
  return new ReadableStream<Uint8Array>({
    async pull(controller) {
      try {
        const rows = await batchAfter(scope, afterId);
        const header = started ? "" : BOM + Papa.unparse([EXPORT_COLUMNS as unknown as string[]]) + "\r\n";
        started = true;
        if (rows.length === 0) {
          if (header) controller.enqueue(encoder.encode(header));
          controller.close();
          return;
        }
        afterId = rows[rows.length - 1].id;
        const body = Papa.unparse(rows.map((r) => EXPORT_COLUMNS.map((c) => neutraliseFormula(String(r[c])))), { newline: "\r\n" });
        controller.enqueue(encoder.encode(header + body + "\r\n"));
      } catch (error) {
        logFailure("CSV export failed", error);
        controller.error(error);
      }
    },
  });
}

export function exportFileName(scope: ReportScope): string {
  const { fromDay, toDay } = scope.filter.period;
  return `rootbench-cases-${fromDay}-to-${toDay}${scope.filter.familySlug ? `-${scope.filter.familySlug}` : ""}.csv`;
}
