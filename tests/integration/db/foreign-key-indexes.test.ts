import { sql } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { db } from "../../support/db";

// Deleting a referenced row makes PostgreSQL look for referencing rows; without an index on the
// referencing column that is a full scan per deleted row. A draft save deletes and rewrites tree
// nodes and options, and case steps grow with every call taken: before these indexes a 300-node
// save scanned every recorded step about a thousand times (3.6–9.7 s on the benchmark database).
const DELETED_IN_NORMAL_WORK = ["tree_nodes", "tree_options", "tree_causes", "tree_versions", "sessions"];

describe("foreign keys into rows the app deletes", () => {
  it("each have an index leading with the referencing column", async () => {
    const missing = await db.execute<{ referencing: string; column: string; referenced: string }>(sql`
      select c.conrelid::regclass::text as referencing, a.attname as column, c.confrelid::regclass::text as referenced
      from pg_constraint c
      join pg_attribute a on a.attrelid = c.conrelid and a.attnum = c.conkey[1]
      where c.contype = 'f'
        and c.confrelid::regclass::text in ${DELETED_IN_NORMAL_WORK}
        and not exists (select 1 from pg_index i where i.indrelid = c.conrelid and i.indkey[0] = c.conkey[1])
      order by 1, 2`);
    expect([...missing]).toEqual([]);
  });
});
