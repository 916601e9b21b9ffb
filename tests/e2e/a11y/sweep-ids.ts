import { db, sql } from "@/db";
import { enqueueMail } from "@/lib/mail/outbox";
import type { SweepIds } from "./screens";

async function one<T>(rows: Promise<T[]>, what: string): Promise<T> {
  const [row] = await rows;
  if (!row) throw new Error(`the seeded database has no ${what}`);
  return row;
}

/** Ids of seeded records for the screens that show one record. */
export async function findSweepIds(): Promise<SweepIds> {
  const firstCase = (status: string) => one(sql<{ id: number }[]>`select id from cases where status = ${status} order by id limit 1`, `${status} case`);
  const practised = one(sql<{ id: number }[]>`
    select c.id from cases c where c.status = 'closed'
      and exists (select 1 from case_steps s where s.case_id = c.id)
      and exists (select 1 from outcome_causes o where o.case_id = c.id)
    order by c.id limit 1`, "practisable case");
  const [open, bookedIn, onBench, practice] = await Promise.all([firstCase("open"), firstCase("booked_in"), firstCase("on_bench"), practised]);
  const tree = await one(sql<{ id: number }[]>`select t.id from trees t where not t.archived and exists (select 1 from tree_versions v where v.tree_id = t.id) order by t.id limit 1`, "tree");
  const cause = await one(sql<{ slug: string }[]>`select slug from causes order by id limit 1`, "cause");
  const writeup = await one(sql<{ id: number }[]>`select id from writeups where status = 'published' order by id limit 1`, "published write-up");
  // A technician edits only their own drafts; seniors and admins edit any write-up.
  const draft = await one(sql<{ id: number }[]>`
    select w.id from writeups w join users u on u.id = w.author_id
    where w.status = 'draft' and u.email = 'tech@rootbench.test' order by w.id limit 1`, "draft by the demo technician");
  const [mail] = await sql<{ id: number }[]>`select id from mail_outbox order by id limit 1`;
  const outboxMessage = mail?.id ?? await enqueueMail(db, {
    to: "sweep@example.test", subject: "Your unit has arrived", text: "We have your drive unit on the bench.",
  });
  return {
    openCase: open.id, bookedInCase: bookedIn.id, onBenchCase: onBench.id, closedCase: practice.id, tree: tree.id, causeSlug: cause.slug,
    writeup: writeup.id, techDraft: draft.id, outboxMessage, practiceCase: practice.id,
  };
}
