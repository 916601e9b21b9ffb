import { Panel, Stat } from "@/components/ui/panel";
import { ROLE_LABELS } from "@/lib/auth/roles";
import type { SessionUser } from "@/lib/auth/session-user";
import { draftWriteups, openCases, recentWriteups, shopCounts } from "@/lib/home/summary";
import { CaseList } from "./case-list";
import { WriteupList } from "./writeup-list";
import { EmptyState } from "@/components/ui/empty-state";
import { PracticeHistoryPanel } from "@/components/practice/practice-history-panel";
import { WaitingForUnitPanel } from "@/components/cases/waiting-for-unit";
import { TopCausesPanel } from "@/components/reports/top-causes-panel";
import { ReviewDigestPanel } from "@/components/review/review-digest-panel";
import { TreeDraftsPanel } from "@/components/trees/home-drafts-panel";

/** One home per role: what that person opens Rootbench for first. */
export async function RoleHome({ user }: { user: SessionUser }) {
  return (
    <div className="flex flex-col gap-6" data-testid={`home-${user.role}`}>
      <div>
        <h1>Good to see you, {user.name.split(" ")[0]}</h1>
        <p className="text-ink-soft">{ROLE_LABELS[user.role]} overview</p>
      </div>
      {user.role === "tech" ? <TechHome user={user} /> : null}
      {user.role === "senior" ? <SeniorHome user={user} /> : null}
      {user.role === "trainee" ? <TraineeHome /> : null}
      {user.role === "lead" ? <LeadHome /> : null}
      {user.role === "admin" ? <AdminHome /> : null}
    </div>
  );
}

async function TechHome({ user }: { user: SessionUser }) {
  const [mine, writeups] = await Promise.all([openCases(user.id), recentWriteups()]);
  return (
    <div className="grid gap-6 md:grid-cols-2">
      <Panel title="Your open cases"><CaseList items={mine} empty="No open cases on your name." /></Panel>
      <WaitingForUnitPanel />
      <Panel title="Recent write-ups"><WriteupList items={writeups} /></Panel>
    </div>
  );
}

async function SeniorHome({ user }: { user: SessionUser }) {
  const [mine, drafts] = await Promise.all([openCases(user.id), draftWriteups()]);
  return (
    <div className="grid gap-6 md:grid-cols-2">
      <Panel title="Write-ups waiting for review">
        {drafts.length === 0 ? <EmptyState title="No drafts waiting." /> : (
          <ul className="flex flex-col gap-1">{drafts.map((d) => <li key={d.id}>{d.title}</li>)}</ul>
        )}
      </Panel>
      <Panel title="Your open cases"><CaseList items={mine} empty="No open cases on your name." /></Panel>
      <ReviewDigestPanel />
      <TreeDraftsPanel />
    </div>
  );
}

async function TraineeHome() {
  const writeups = await recentWriteups();
  return (
    <div className="grid gap-6 md:grid-cols-2">
      <PracticeHistoryPanel />
      <Panel title="Recent write-ups"><WriteupList items={writeups} /></Panel>
    </div>
  );
}

async function LeadHome() {
  const [counts, open] = await Promise.all([shopCounts(), openCases(undefined, 10)]);
  return (
    <>
      <div className="grid gap-4 sm:grid-cols-3">
        <Stat label="Open cases" value={counts.open} />
        <Stat label="Closed this month" value={counts.closedThisMonth} />
        <Stat label="Active accounts" value={counts.activeUsers} />
      </div>
      <div className="grid gap-6 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
        <Panel title="Open cases in the shop"><CaseList items={open} empty="No open cases." /></Panel>
        <TopCausesPanel />
      </div>
    </>
  );
}

async function AdminHome() {
  const counts = await shopCounts();
  return (
    <div className="grid gap-4 sm:grid-cols-3">
      <Stat label="Active accounts" value={counts.activeUsers} />
      <Stat label="Open cases" value={counts.open} />
      <Stat label="Mail waiting to send" value={counts.queuedMail} />
    </div>
  );
}
