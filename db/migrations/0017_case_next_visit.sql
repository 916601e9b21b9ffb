DROP INDEX "cases_visits_idx";--> statement-breakpoint
ALTER TABLE "cases" ADD COLUMN "next_visit_at" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "cases" ADD COLUMN "next_visit_cause_ids" integer[];--> statement-breakpoint
CREATE INDEX "cases_visits_idx" ON "cases" USING btree ("family_id","serial","created_at","id") WHERE "cases"."serial" <> '';--> statement-breakpoint
-- Backfill: each case's copy of the unit's next visit (the next case of the same motor family and
-- serial by opening time, then id), computed as the trigger below keeps it.
UPDATE "cases" c SET "next_visit_at" = n."next_at", "next_visit_cause_ids" = n."next_causes"
FROM (SELECT "id", lead("created_at") OVER w AS "next_at", lead("confirmed_cause_ids") OVER w AS "next_causes"
      FROM "cases" WHERE "serial" <> ''
      WINDOW w AS (PARTITION BY "family_id", "serial" ORDER BY "created_at", "id")) n
WHERE n."id" = c."id" AND n."next_at" IS NOT NULL;--> statement-breakpoint
CREATE INDEX "cases_follow_up_idx" ON "cases" USING btree ("family_id","closed_at","riding_use","primary_cause_id","fitted_upgrades","next_visit_at","next_visit_cause_ids") WHERE "cases"."status" = 'closed' and "cases"."serial" <> '';--> statement-breakpoint
-- Recomputes the next-visit copies of one unit's visits (one motor family and serial) and writes the
-- rows whose copy differs: only ever the visit written and the visit before it.
--
-- Lock order: the writer already holds the case row it writes (the case row first); this then locks
-- the visit before it, an earlier visit, and nothing else. A concurrent writer of the same unit (two
-- bookings of one serial) may hold that row: the lock waits for it, and the recomputation runs in a
-- new statement, whose fresh snapshot (READ COMMITTED) sees what the other writer committed. If the
-- visit before is then another row (the other writer put a visit in between), the lock on the old
-- one is let go (the block's subtransaction is rolled back) before the new one is taken: a writer
-- never waits while holding an earlier visit than the one it waits for, so no cycle can form. No
-- advisory lock on the unit: taken after the case row, it would deadlock against a writer holding
-- that lock and waiting for this writer's case row.
CREATE FUNCTION rootbench_refresh_next_visits(unit_family integer, unit_serial text, visit_at timestamptz, visit_id integer) RETURNS void AS $$
DECLARE
  locked integer;
BEGIN
  LOOP
    BEGIN
      SELECT id INTO locked FROM cases
        WHERE family_id = unit_family AND serial = unit_serial AND serial <> '' AND (created_at, id) < (visit_at, visit_id)
        ORDER BY created_at DESC, id DESC LIMIT 1 FOR UPDATE;
      IF locked IS NOT DISTINCT FROM (SELECT id FROM cases
          WHERE family_id = unit_family AND serial = unit_serial AND serial <> '' AND (created_at, id) < (visit_at, visit_id)
          ORDER BY created_at DESC, id DESC LIMIT 1) THEN
        UPDATE cases c SET next_visit_at = n.next_at, next_visit_cause_ids = n.next_causes
        FROM (SELECT id, lead(created_at) OVER w AS next_at, lead(confirmed_cause_ids) OVER w AS next_causes
              FROM cases WHERE family_id = unit_family AND serial = unit_serial AND serial <> ''
              WINDOW w AS (ORDER BY created_at, id)) n
        WHERE c.id = n.id AND (c.next_visit_at, c.next_visit_cause_ids) IS DISTINCT FROM (n.next_at, n.next_causes);
        RETURN;
      END IF;
      RAISE SQLSTATE 'RB002';
    EXCEPTION WHEN SQLSTATE 'RB002' THEN
      -- The visit before changed while this waited: let its lock go and look again.
    END;
  END LOOP;
END;
$$ LANGUAGE plpgsql;
--> statement-breakpoint
-- Keeps the copies true for every writer of cases (booking, bench outcome, import, seeds, deletes):
-- the unit the visit left and the unit it joined (the same one unless family, serial or opening
-- time changed). A case without a serial has no next visit.
CREATE FUNCTION rootbench_case_next_visit() RETURNS trigger AS $$
BEGIN
  IF TG_OP = 'DELETE' OR (TG_OP = 'UPDATE' AND (OLD.family_id, OLD.serial, OLD.created_at) IS DISTINCT FROM (NEW.family_id, NEW.serial, NEW.created_at)) THEN
    IF OLD.serial <> '' THEN
      PERFORM rootbench_refresh_next_visits(OLD.family_id, OLD.serial, OLD.created_at, OLD.id);
    END IF;
  END IF;
  IF TG_OP <> 'DELETE' THEN
    IF NEW.serial <> '' THEN
      PERFORM rootbench_refresh_next_visits(NEW.family_id, NEW.serial, NEW.created_at, NEW.id);
    ELSE
      UPDATE cases SET next_visit_at = NULL, next_visit_cause_ids = NULL
        WHERE id = NEW.id AND (next_visit_at IS NOT NULL OR next_visit_cause_ids IS NOT NULL);
    END IF;
  END IF;
  RETURN NULL;
END;
$$ LANGUAGE plpgsql;
--> statement-breakpoint
CREATE TRIGGER cases_next_visit_written AFTER INSERT OR DELETE ON cases
  FOR EACH ROW EXECUTE FUNCTION rootbench_case_next_visit();
--> statement-breakpoint
CREATE TRIGGER cases_next_visit_changed AFTER UPDATE OF family_id, serial, created_at, confirmed_cause_ids ON cases
  FOR EACH ROW WHEN ((OLD.family_id, OLD.serial, OLD.created_at, OLD.confirmed_cause_ids) IS DISTINCT FROM (NEW.family_id, NEW.serial, NEW.created_at, NEW.confirmed_cause_ids))
  EXECUTE FUNCTION rootbench_case_next_visit();
